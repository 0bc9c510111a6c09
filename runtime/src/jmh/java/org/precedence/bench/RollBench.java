package org.precedence.bench;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
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
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.runtime.provider.DiceSession;
import org.precedence.runtime.provider.FairDiceProvider;
import org.precedence.runtime.provider.FastOrders;
import org.precedence.runtime.randomness.RollGenerator;

/**
 * One round's turn order against the shuffle it replaces, measured side by side:
 * {@code Collections.shuffle(list, random)} on the same list size in the same run.
 *
 * <pre>
 * mvn -B -q -Pbench -pl runtime -am package -DskipTests
 * java -jar runtime/target/benchmarks.jar RollBench -f 1 -wi 3 -i 5
 * </pre>
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class RollBench {
    private FastOrders fast;
    private FastOrders fastV1;
    private FastOrders fastV2;
    private FastOrders secure;
    private DiceSession session;
    private final int[] out = new int[64];
    private final long[] faces = new long[16];
    private final BigInteger[] bigFaces = new BigInteger[16];
    private List<Integer> list4;
    private List<Integer> list10;
    private List<Integer> list64;
    private Random random;
    private long round;

    @Setup
    public void setup() {
        SessionSeed seed = SessionSeed.fromText("bench");
        FairDiceProvider provider = new FairDiceProvider();
        session = provider.open(SessionSpec.of(seed));
        fast = session.fastOrders();
        secure = provider.open(new SessionSpec(seed, RandomnessMode.SECURE, OrderRule.FRESH_EACH_ROUND,
                RankingConvention.LOWEST_FIRST)).fastOrders();
        fastV1 = DiceSession.open(SessionSpec.of(seed), FairDiceProvider.standardSets(), RollGenerator.FAST_V1_ID)
                .fastOrders();
        fastV2 = DiceSession.open(SessionSpec.of(seed), FairDiceProvider.standardSets(), RollGenerator.FAST_V2_ID)
                .fastOrders();
        list4 = new ArrayList<>(List.of(0, 1, 2, 3));
        list10 = new ArrayList<>(List.of(0, 1, 2, 3, 4, 5, 6, 7, 8, 9));
        list64 = new ArrayList<>();
        for (int i = 0; i < 64; i++) {
            list64.add(i);
        }
        random = new Random(20261202L);
    }

    private long nextRound() {
        round = (round + 1) & 0xFFFFFF;
        return round;
    }

    /** The peer: the shuffle an engine would otherwise call, 4 players. */
    @Benchmark
    public List<Integer> shuffle4() {
        Collections.shuffle(list4, random);
        return list4;
    }

    /** Fast mode, 4 players, order and every player's face value (allocation-free path). */
    @Benchmark
    public void fastWithFaces4(Blackhole bh) {
        fast.orderInto(nextRound(), 4, out, faces);
        bh.consume(out);
        bh.consume(faces);
    }

    /** The retired v1 fast algorithm (one block per round), for comparison in the same run. */
    @Benchmark
    public void fastV1WithFaces4(Blackhole bh) {
        fastV1.orderInto(nextRound(), 4, out, faces);
        bh.consume(out);
        bh.consume(faces);
    }

    /** Fast mode, 4 players, rounds in scattered order: no help from stepping the counter. */
    @Benchmark
    public void fastScatteredWithFaces4(Blackhole bh) {
        fast.orderInto(nextRound() * 0x9E3779B97F4A7C15L >>> 1, 4, out, faces);
        bh.consume(out);
        bh.consume(faces);
    }

    /** Fast mode, 4 players, the general path: a full RoundResult with BigInteger faces. */
    @Benchmark
    public RoundResult roundResult4() {
        return session.roll(nextRound(), 4);
    }

    /**
     * Fast mode, 10 players, {@link DiceSession#roll}: a full RoundResult for the construction's
     * set, ranked by prefix keys, exact faces and face indices computed on long digits. About 61×
     * shuffle10 (medians, one run); the lazy digit-by-digit path it replaced was about 261×.
     */
    @Benchmark
    public RoundResult roundResult10() {
        return session.roll(nextRound(), 10);
    }

    /** Secure mode (HMAC-SHA256), 4 players, same path as fastWithFaces4. */
    @Benchmark
    public void secureWithFaces4(Blackhole bh) {
        secure.orderInto(nextRound(), 4, out, faces);
        bh.consume(out);
        bh.consume(faces);
    }

    /** The peer for 10 players. */
    @Benchmark
    public List<Integer> shuffle10() {
        Collections.shuffle(list10, random);
        return list10;
    }

    /**
     * Fast mode, 10 players: the construction's set (10 digits per face, about 4.1·10^41 sides),
     * ranked by the leading keys (two Philox blocks a round), digits only on a tie.
     */
    @Benchmark
    public void fastConstructed10(Blackhole bh) {
        fast.orderInto(nextRound(), 10, out);
        bh.consume(out);
    }

    /** The retired v2 fast algorithm on the same set (leading digits drawn one by one), same run. */
    @Benchmark
    public void fastV2Constructed10(Blackhole bh) {
        fastV2.orderInto(nextRound(), 10, out);
        bh.consume(out);
    }

    /**
     * Fast mode, 10 players, the construction's set with faces: the order and every player's
     * exact face value (a BigInteger, as DiceSession.roll reports it). About 40× shuffle10
     * (medians, one run). Where it goes (JFR): about half in the ten face values, mostly the six
     * chained Lehmer preimages per die; an eighth in the Philox blocks (two for the keys, five
     * wide digits × three lane groups, the two narrow digits kept across four rounds); the
     * rest in building the BigIntegers, spelling the leading keys and the limb arithmetic.
     */
    @Benchmark
    public void fastConstructedWithFaces10(Blackhole bh) {
        fast.orderInto(nextRound(), 10, out, bigFaces);
        bh.consume(out);
        bh.consume(bigFaces);
    }

    /** The peer for 64 players, the most served. */
    @Benchmark
    public List<Integer> shuffle64() {
        Collections.shuffle(list64, random);
        return list64;
    }

    /**
     * Fast mode, 64 players: the key is the top reversal and the top 61 bits of the S64 digit
     * (64! ≈ 2^296, drawn by masked rejection over five words), so ties stay as rare as above.
     */
    @Benchmark
    public void fastConstructed64(Blackhole bh) {
        fast.orderInto(nextRound(), 64, out);
        bh.consume(out);
    }

    /** Round 1 and round 10^9 cost the same: counter-based, no stepping (rounds 1/2 vs 10^9/10^9+1). */
    @Benchmark
    public void fastRound1(Blackhole bh) {
        fast.orderInto(1 + (nextRound() & 1), 4, out, faces);
        bh.consume(out);
        bh.consume(faces);
    }

    @Benchmark
    public void fastRoundBillion(Blackhole bh) {
        fast.orderInto(1_000_000_000L + (nextRound() & 1), 4, out, faces);
        bh.consume(out);
        bh.consume(faces);
    }
}
