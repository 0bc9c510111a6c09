package org.precedence.bench;

import java.util.Arrays;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.analysis.FairnessReport;
import org.precedence.runtime.analysis.PatternTable;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.Word;

/**
 * Exact analysis of random words (speed does not depend on fairness, only on the number of
 * dice and letters), against two peers measured in the same run:
 * <ul>
 *   <li>{@code bruteForceFiveDice12}: enumerating all 12^5 = 248,832 outcomes of a 5-dice,
 *       12-sided set — the method the pattern table replaces — next to {@code
 *       analyseFiveDice12}, the engine on the very same set. Their ratio is the point of the
 *       design; for 60 sides brute force would need 60^5 ≈ 7.8·10^8 outcomes.</li>
 *   <li>{@code sortThousandFaces}: {@code Arrays.sort} of 1,000 random longs, the first step
 *       of turning any 1,000-face set into its word — a machine-speed yardstick.</li>
 * </ul>
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class AnalysisBenchmark {
    private Word fiveDice60;
    private Word eightDice1000;
    private Word fiveDice12;
    private DiceSet fiveDice12Set;
    private long[] thousandFaces;

    @Setup
    public void setUp() {
        SplittableRandom rnd = new SplittableRandom(20_261_202L);
        fiveDice60 = randomWord(rnd, 5, 60);
        eightDice1000 = randomWord(rnd, 8, 125);
        fiveDice12 = randomWord(rnd, 5, 12);
        fiveDice12Set = fiveDice12.toDiceSet();
        thousandFaces = rnd.longs(1000).toArray();
    }

    private static Word randomWord(SplittableRandom rnd, int players, int sides) {
        int[] letters = new int[players * sides];
        for (int i = 0; i < letters.length; i++) {
            letters[i] = i % players;
        }
        for (int i = letters.length - 1; i > 0; i--) {
            int j = rnd.nextInt(i + 1);
            int t = letters[i];
            letters[i] = letters[j];
            letters[j] = t;
        }
        return Word.of(players, letters);
    }

    @Benchmark
    public FairnessReport analyseFiveDice60() {
        return FairnessAnalysis.analyse(fiveDice60, RankingConvention.LOWEST_FIRST);
    }

    @Benchmark
    public PatternTable patternTableFiveDice60() {
        return PatternTable.count(fiveDice60);
    }

    @Benchmark
    public FairnessReport analyseEightDice1000() {
        return FairnessAnalysis.analyse(eightDice1000, RankingConvention.LOWEST_FIRST);
    }

    @Benchmark
    public PatternTable patternTableEightDice1000() {
        return PatternTable.count(eightDice1000);
    }

    @Benchmark
    public FairnessReport analyseFiveDice12() {
        return FairnessAnalysis.analyse(fiveDice12, RankingConvention.LOWEST_FIRST);
    }

    /** Rolls every combination of faces and tallies rankings by their Lehmer-code index. */
    @Benchmark
    public long[] bruteForceFiveDice12() {
        DiceSet set = fiveDice12Set;
        int n = set.players();
        int[] sides = set.sides();
        long[][] faces = new long[n][];
        for (int d = 0; d < n; d++) {
            faces[d] = set.faces(d);
        }
        long[] counts = new long[120];
        int[] face = new int[n];
        long[] v = new long[n];
        while (true) {
            for (int d = 0; d < n; d++) {
                v[d] = faces[d][face[d]];
            }
            // Lehmer code of the value order: how many later dice rolled lower, per die.
            int index = 0;
            for (int d = 0; d < n; d++) {
                int lower = 0;
                for (int e = d + 1; e < n; e++) {
                    lower += v[e] < v[d] ? 1 : 0;
                }
                index = index * (n - d) + lower;
            }
            counts[index]++;
            int d = 0;
            while (d < n && ++face[d] == sides[d]) {
                face[d] = 0;
                d++;
            }
            if (d == n) {
                return counts;
            }
        }
    }

    @Benchmark
    public long[] sortThousandFaces() {
        long[] copy = thousandFaces.clone();
        Arrays.sort(copy);
        return copy;
    }
}
