package org.precedence.bench;

import java.util.concurrent.TimeUnit;
import org.apache.commons.rng.core.source64.Philox4x64;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;
import org.precedence.api.RandomnessMode;
import org.precedence.api.SessionSeed;
import org.precedence.runtime.randomness.RollGenerator;

/**
 * The cost of one block (four words) of each way of using the library's Philox4x64, and of the
 * secure generator, for choosing the cheapest correct one.
 *
 * <pre>java -jar runtime/target/benchmarks.jar PhiloxBench -f 1 -wi 5 -i 5</pre>
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class PhiloxBench {
    private Philox4x64 stream;
    private RollGenerator fast;
    private RollGenerator secure;
    private final long[] out = new long[4];
    private long c;

    @Setup
    public void setup() {
        stream = new Philox4x64(new long[] {1, 2, 0, 0, 0, 0});
        fast = RollGenerator.of(RandomnessMode.FAST, SessionSeed.fromText("bench"));
        secure = RollGenerator.of(RandomnessMode.SECURE, SessionSeed.fromText("bench"));
    }

    /** Four next() calls on one kept generator: one block, the floor. */
    @Benchmark
    public void streamNext4(Blackhole bh) {
        bh.consume(stream.next() ^ stream.next() ^ stream.next() ^ stream.next());
    }

    /** A generator constructed at the wanted counter, then four next() calls. */
    @Benchmark
    public void constructNext4(Blackhole bh) {
        Philox4x64 g = new Philox4x64(new long[] {1, 2, ++c, 0, 0, 0});
        bh.consume(g.next() ^ g.next() ^ g.next() ^ g.next());
    }

    @Benchmark
    public void generatorBlock(Blackhole bh) {
        fast.block(++c, 0, 0, 0, out);
        bh.consume(out);
    }

    @Benchmark
    public void secureBlock(Blackhole bh) {
        secure.block(++c, 0, 0, 0, out);
        bh.consume(out);
    }
}
