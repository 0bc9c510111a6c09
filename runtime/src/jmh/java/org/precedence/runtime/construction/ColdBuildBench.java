package org.precedence.runtime.construction;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.source.SetSource;
import org.precedence.runtime.source.SetSources;

/**
 * How long the first request for 10 dice takes, against a peer measured in the same run.
 *
 * <p>{@code firstRequestTenDice}: the first {@code forPlayers(10)} of a standard source created
 * beforehand (as an application creates it at start-up). {@code freshFamiliesTenDice}: the plan
 * and the mixed-radix view from newly built families (field tables rebuilt), i.e. what a first
 * request costs without anything cached. {@code familyProofsTenDice}: re-running every family
 * proof of the 10-dice plan (what {@code precedence set} adds to show them; off the serving
 * path). The peer is {@link Collections#shuffle} of 10 items, the call a set replaces.
 *
 * <p>Run: {@code mvn -B -q -Pbench -pl runtime -am package -DskipTests && java -jar
 * runtime/target/benchmarks.jar ColdBuildBench -f 1 -wi 3 -i 5}; for the very first request of
 * a fresh JVM use {@code -f 5 -wi 0 -i 1}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class ColdBuildBench {
    private final Random random = new Random(10);
    private SetSource source;

    @Setup(Level.Iteration)
    public void newSource() {
        source = SetSources.standard();
    }

    @Benchmark
    public MixedRadixDice firstRequestTenDice() {
        return source.forPlayers(10);
    }

    @Benchmark
    public MixedRadixDice freshFamiliesTenDice() {
        List<org.precedence.runtime.construction.Level> levels = new ArrayList<>();
        for (org.precedence.runtime.construction.Level level : Construction.smallest(10).levels()) {
            levels.add(level.isReversal() ? level
                    : org.precedence.runtime.construction.Level.relabelling(fresh(level.family()), level.liftsTo()));
        }
        return new ConstructedDice(new Construction(StartingWord.letters(10), levels));
    }

    @Benchmark
    public List<FamilyProof> familyProofsTenDice() {
        List<FamilyProof> proofs = new ArrayList<>();
        for (org.precedence.runtime.construction.Level level : Construction.smallest(10).levels()) {
            if (!level.isReversal()) {
                proofs.add(fresh(level.family()).prove());
            }
        }
        return proofs;
    }

    private static PermutationFamily fresh(PermutationFamily f) {
        String name = f.name();
        if (name.startsWith("AGL")) {
            return new AffineFamily(f.points());
        }
        if (name.startsWith("PGL")) {
            return new ProjectiveFamily(f.points() - 1);
        }
        if (name.startsWith("A")) {
            return new AlternatingFamily(f.points());
        }
        if (name.startsWith("S")) {
            return new SymmetricFamily(f.points());
        }
        return f;
    }

    @Benchmark
    public List<Integer> peerShuffleTen() {
        List<Integer> items = new ArrayList<>(10);
        for (int i = 0; i < 10; i++) {
            items.add(i);
        }
        Collections.shuffle(items, random);
        return items;
    }
}
