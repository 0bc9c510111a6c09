package org.precedence.runtime.search;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.analysis.FairnessReport;
import org.precedence.runtime.dice.Word;

/**
 * Exhaustive search times, with a peer measured in the same run: the exact analysis of one
 * 3-dice 6-sided set. The ratio says how many single-set analyses a complete search costs.
 *
 * <p>Run: {@code mvn -B -q -Pbench -pl runtime -am package -DskipTests && java -jar
 * runtime/target/benchmarks.jar SearchBenchmark -f 1 -wi 3 -i 5}
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class SearchBenchmark {
    private final Word threeBySix = Word.parse("ABCCBABACCABCABBAC");

    /** Peer: exact analysis of one order-fair 3 x 6 set. */
    @Benchmark
    public FairnessReport peerAnalyseOneSet() {
        return FairnessAnalysis.analyse(threeBySix, RankingConvention.LOWEST_FIRST);
    }

    /** Every order-fair set of three 6-sided dice (six classes). */
    @Benchmark
    public SearchResult threeDiceSixSidesComplete() {
        return FairSetSearch.run(SearchRequest.orderFair(6, 6, 6));
    }

    /** The proof that four 6-sided order-fair dice do not exist. */
    @Benchmark
    public SearchResult fourDiceSixSidesImpossible() {
        return FairSetSearch.run(SearchRequest.orderFair(6, 6, 6, 6));
    }

    /** Every order-fair set of four dice with sides 4, 6, 8, 12 (the least total for 4 dice). */
    @Benchmark
    public SearchResult fourDiceMixedComplete() {
        return FairSetSearch.run(SearchRequest.orderFair(4, 6, 8, 12));
    }
}
