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
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.source.SetSources;

/**
 * How long the first request for 10 dice takes, against a peer measured in the same run.
 *
 * <p>{@code coldTenDice} repeats everything a first request does that a process would otherwise
 * cache: fresh family objects (so the field tables are rebuilt), every family proof run again,
 * then the plan and the mixed-radix view. {@code firstRequestTenDice} is a new standard source's
 * first {@code forPlayers(10)} (family proofs already cached by earlier iterations). The peer is
 * {@link Collections#shuffle} of 10 items, the call a set replaces.
 *
 * <p>Run: {@code mvn -B -q -Pbench -pl runtime -am package -DskipTests && java -jar
 * runtime/target/benchmarks.jar ColdBuildBench -f 1 -wi 3 -i 5}
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class ColdBuildBench {
    private final Random random = new Random(10);

    @Benchmark
    public MixedRadixDice coldTenDice() {
        Construction plan = Construction.smallest(10);
        for (Level level : plan.levels()) {
            PermutationFamily f = level.family();
            if (f == null) {
                continue;
            }
            PermutationFamily fresh = switch (f.name().charAt(0)) {
                case 'S' -> new SymmetricFamily(f.points());
                case 'A' -> f.name().startsWith("AGL") ? new AffineFamily(f.points()) : new AlternatingFamily(f.points());
                case 'P' -> new ProjectiveFamily(f.points() - 1);
                default -> f;
            };
            fresh.prove();
        }
        return new ConstructedDice(plan);
    }

    @Benchmark
    public MixedRadixDice firstRequestTenDice() {
        return SetSources.standard().forPlayers(10);
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
