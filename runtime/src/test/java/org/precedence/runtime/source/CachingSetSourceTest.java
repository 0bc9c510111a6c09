package org.precedence.runtime.source;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;
import org.junit.jupiter.api.Test;
import org.precedence.api.FairnessGrade;
import org.precedence.runtime.construction.ConstructedDice;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.dice.Word;

class CachingSetSourceTest {

    /** A builder that counts its calls per key and is slow enough for requests to overlap. */
    static final class CountingBuilder implements Function<SetKey, MixedRadixDice> {
        final ConcurrentHashMap<SetKey, AtomicInteger> calls = new ConcurrentHashMap<>();
        private final Function<SetKey, MixedRadixDice> real = new CatalogFirstBuilder(n -> Optional.empty());

        @Override
        public MixedRadixDice apply(SetKey key) {
            calls.computeIfAbsent(key, k -> new AtomicInteger()).incrementAndGet();
            try {
                Thread.sleep(50);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return real.apply(key);
        }
    }

    @Test
    void forPlayers_manyConcurrentFirstRequests_buildOnce() throws Exception {
        CountingBuilder builder = new CountingBuilder();
        CachingSetSource source = new CachingSetSource(builder, 64, 16);
        int threads = 48;
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        CountDownLatch go = new CountDownLatch(1);
        List<Future<MixedRadixDice>> results = new ArrayList<>();
        for (int t = 0; t < threads; t++) {
            int players = 5 + t % 3;
            results.add(pool.submit(() -> {
                go.await();
                return source.forPlayers(players);
            }));
        }
        go.countDown();
        List<MixedRadixDice> got = new ArrayList<>();
        for (Future<MixedRadixDice> f : results) {
            got.add(f.get(60, TimeUnit.SECONDS));
        }
        pool.shutdown();
        assertEquals(3, builder.calls.size());
        for (AtomicInteger c : builder.calls.values()) {
            assertEquals(1, c.get());
        }
        for (int t = 0; t < threads; t++) {
            assertSame(got.get(t % 3), got.get(t));
        }
    }

    @Test
    void forPlayers_cacheIsBounded() {
        CountingBuilder builder = new CountingBuilder();
        CachingSetSource source = new CachingSetSource(builder, 64, 2);
        for (int n = 2; n <= 9; n++) {
            source.forPlayers(n);
        }
        assertTrue(source.cachedSets() <= 2, "cached " + source.cachedSets());
    }

    @Test
    void forPlayers_afterEviction_rebuildsTheSameSet() {
        // SetSource promises the same set for the life of the process; eviction may drop the
        // object, so the rebuilt one must be the same set (same canonical hash, same faces).
        CachingSetSource source = new CachingSetSource(new CatalogFirstBuilder(n -> Optional.empty()), 64, 1);
        MixedRadixDice first = source.forPlayers(5);
        for (int n = 6; n <= 9; n++) {
            source.forPlayers(n);
        }
        source.cachedSets();
        MixedRadixDice again = source.forPlayers(5);
        assertEquals(first.sha256(), again.sha256());
        assertEquals(first.id(), again.id());
        BigInteger[] digits = new BigInteger[first.digits()];
        for (int j = 0; j < digits.length; j++) {
            digits[j] = first.radix(0, j).subtract(BigInteger.ONE);
        }
        assertEquals(first.faceValue(2, digits), again.faceValue(2, digits));
    }

    @Test
    void forPlayers_badInput_namesTheSupportedRange() {
        CountingBuilder builder = new CountingBuilder();
        CachingSetSource source = new CachingSetSource(builder, 64, 4);
        IllegalArgumentException low = assertThrows(IllegalArgumentException.class, () -> source.forPlayers(1));
        assertTrue(low.getMessage().contains("2..64"), low.getMessage());
        IllegalArgumentException high = assertThrows(IllegalArgumentException.class, () -> source.forPlayers(65));
        assertTrue(high.getMessage().contains("2..64"), high.getMessage());
        IllegalArgumentException grade = assertThrows(IllegalArgumentException.class,
                () -> source.forPlayers(4, FairnessGrade.UNFAIR));
        assertTrue(grade.getMessage().contains("ORDER_FAIR"), grade.getMessage());
        assertThrows(IllegalArgumentException.class, () -> source.forPlayers(4, null));
        assertEquals(0, builder.calls.size());
    }

    @Test
    void withCatalog_catalogFirstThenConstruction() {
        // Our own "catalog": the 3-dice set this library builds, written out (12 sides).
        assertTrue(FairnessAnalysis.analyse(materialisedThree().toDiceSet()).orderFair());
        ExplicitDice listed = new ExplicitDice("own-3", materialisedThree().toDiceSet(),
                FairnessGrade.ORDER_FAIR, 3);
        SetSource source = SetSources.withCatalog(n -> n == 3 ? Optional.of(listed) : Optional.empty());
        assertSame(listed, source.forPlayers(3));
        MixedRadixDice four = source.forPlayers(4);
        assertInstanceOf(ConstructedDice.class, four);
        assertEquals(FairnessGrade.ORDER_FAIR, four.grade());
        assertEquals(64, source.maxPlayers());
    }

    @Test
    void withCatalog_weakerCatalogGrade_fallsBackToConstruction() {
        ExplicitDice seatOnly = new ExplicitDice("seat-4", Word.parse("ABCDDCBA").toDiceSet(),
                FairnessGrade.SEAT_FAIR, 2);
        SetSource source = SetSources.withCatalog(n -> n == 4 ? Optional.of(seatOnly) : Optional.empty());
        assertSame(seatOnly, source.forPlayers(4, FairnessGrade.SEAT_FAIR));
        MixedRadixDice fair = source.forPlayers(4, FairnessGrade.ORDER_FAIR);
        assertInstanceOf(ConstructedDice.class, fair);
        assertEquals(4, fair.subsetDepth());
    }

    @Test
    void withCatalog_overstatedCatalogDepth_isNotUsedAsStart() {
        // ABCABC has depth 1 but claims 2 (and only lead-fairness): not a start, not served.
        ExplicitDice liar = new ExplicitDice("liar-3", Word.parse("ABCABC").toDiceSet(), FairnessGrade.LEAD_FAIR, 2);
        SetSource source = SetSources.withCatalog(n -> n == 3 ? Optional.of(liar) : Optional.empty());
        MixedRadixDice three = source.forPlayers(3, FairnessGrade.ORDER_FAIR);
        assertInstanceOf(ConstructedDice.class, three);
        assertEquals(BigInteger.valueOf(6), three.sides(0));
    }

    @Test
    void standard_servesSixtyFourPlayers() {
        MixedRadixDice big = SetSources.standard().forPlayers(64);
        assertEquals(64, big.players());
        assertEquals(org.precedence.runtime.construction.Construction.smallest(64).levels().size(), big.digits());
        assertEquals(64, big.subsetDepth());
    }

    private static Word materialisedThree() {
        // ABCCBA relabelled by the six permutations of S3, in Lehmer order.
        return Word.parse("ABCCBA" + "ACBBCA" + "BACCAB" + "BCAACB" + "CABBAC" + "CBAABC");
    }
}
