package org.precedence.runtime.construction;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.precedence.runtime.source.SetSource;
import org.precedence.runtime.source.SetSources;

/**
 * Creating the standard source, which loads and verifies the shipped catalog once per JVM: the
 * start-up cost an application pays before its first request (see {@link ColdBuildBench}).
 *
 * <p>Run in fresh JVMs: {@code java -jar runtime/target/benchmarks.jar SourceStartupBench -f 5 -wi 0 -i 1}
 */
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class SourceStartupBench {

    @Benchmark
    public SetSource createStandardSource() {
        return SetSources.standard();
    }
}
