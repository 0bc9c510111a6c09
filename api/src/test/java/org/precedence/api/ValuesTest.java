package org.precedence.api;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;
import org.junit.jupiter.api.Test;

class ValuesTest {
    private static final HexFormat HEX = HexFormat.of();

    // FIPS 180-4 example: SHA-256("abc"); the same digest defines fromText and commitment.
    @Test
    void fromText_isSha256OfPrefixedText() throws Exception {
        MessageDigest sha = MessageDigest.getInstance("SHA-256");
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                HEX.formatHex(sha.digest("abc".getBytes(StandardCharsets.US_ASCII))));
        SessionSeed seed = SessionSeed.fromText("abc");
        assertArrayEquals(sha.digest("precedence-seed-v1:abc".getBytes(StandardCharsets.UTF_8)), seed.bytes());
        assertEquals(HEX.formatHex(sha.digest(seed.bytes())), seed.commitment());
        assertEquals(SessionSeed.fromText("42"), SessionSeed.fromNumber(42));
    }

    @Test
    void seed_parsesHexAndRejectsBadInput() {
        SessionSeed s = SessionSeed.fromText("river");
        assertEquals(s, SessionSeed.parse("hex:" + s.toHex()));
        assertEquals(s, SessionSeed.fromHex(s.toHex().toUpperCase(java.util.Locale.ROOT)));
        assertTrue(s.matchesCommitment(s.commitment().toUpperCase(java.util.Locale.ROOT)));
        assertFalse(s.matchesCommitment("00"));
        assertFalse(s.toString().contains(s.toHex()), "toString never shows the secret");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SessionSeed.fromHex("abc"));
        assertEquals("a hex seed has exactly 64 hexadecimal digits, got 3", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> SessionSeed.fromHex("g" + "0".repeat(63)));
        assertEquals("a hex seed may only contain 0-9 and a-f; character 1 is not a hexadecimal digit", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> SessionSeed.fromText("  "));
        assertThrows(IllegalArgumentException.class, () -> SessionSeed.ofBytes(new byte[31]));
        assertThrows(NullPointerException.class, () -> SessionSeed.parse(null));
        byte[] raw = new byte[32];
        SessionSeed fromBytes = SessionSeed.ofBytes(raw);
        raw[0] = 1;
        assertNotEquals(SessionSeed.ofBytes(raw), fromBytes, "the seed copied its bytes");
        assertNotEquals(SessionSeed.random(), SessionSeed.random());
    }

    @Test
    void roundResult_checksConsistency() {
        RoundResult ok = TurnOrderSourceContractTest.result(2, 1, 0);
        assertEquals(1, ok.first());
        assertEquals(0, ok.last());
        assertEquals(1, ok.positionOf(0));
        assertEquals(List.of(BigInteger.valueOf(11), BigInteger.ONE), ok.faceValues());
        PlayerRoll a0 = new PlayerRoll(0, "A", BigInteger.ZERO, BigInteger.ONE, 0);
        PlayerRoll b1 = new PlayerRoll(1, "B", BigInteger.ZERO, BigInteger.TWO, 1);
        assertThrows(IllegalArgumentException.class,
                () -> new RoundResult(-1, List.of(0, 1), List.of(a0, b1), FairnessGrade.ORDER_FAIR, "s"));
        assertThrows(IllegalArgumentException.class,
                () -> new RoundResult(0, List.of(0, 0), List.of(a0, b1), FairnessGrade.ORDER_FAIR, "s"));
        assertThrows(IllegalArgumentException.class,
                () -> new RoundResult(0, List.of(1, 0), List.of(a0, b1), FairnessGrade.ORDER_FAIR, "s"));
        assertThrows(IllegalArgumentException.class,
                () -> new RoundResult(0, List.of(0, 1), List.of(b1, a0), FairnessGrade.ORDER_FAIR, "s"));
        assertThrows(IllegalArgumentException.class,
                () -> new RoundResult(0, List.of(), List.of(), FairnessGrade.ORDER_FAIR, "s"));
        assertThrows(NullPointerException.class,
                () -> new RoundResult(0, List.of(0, 1), List.of(a0, b1), null, "s"));
        assertThrows(IllegalArgumentException.class,
                () -> new PlayerRoll(-1, "A", BigInteger.ZERO, BigInteger.ONE, 0));
        assertThrows(IllegalArgumentException.class,
                () -> new PlayerRoll(0, "A", BigInteger.ONE.negate(), BigInteger.ONE, 0));
    }

    @Test
    void spec_defaultsAndCopies() {
        SessionSeed seed = SessionSeed.fromText("spec");
        SessionSpec spec = SessionSpec.of(seed);
        assertEquals(RandomnessMode.FAST, spec.mode());
        assertEquals(OrderRule.FRESH_EACH_ROUND, spec.rule());
        assertEquals(RankingConvention.LOWEST_FIRST, spec.convention());
        assertEquals(RandomnessMode.SECURE, spec.withMode(RandomnessMode.SECURE).mode());
        assertEquals(OrderRule.SNAKE, spec.withRule(OrderRule.SNAKE).rule());
        assertEquals(RankingConvention.HIGHEST_FIRST, spec.withConvention(RankingConvention.HIGHEST_FIRST).convention());
        assertThrows(NullPointerException.class, () -> new SessionSpec(null, RandomnessMode.FAST,
                OrderRule.SNAKE, RankingConvention.LOWEST_FIRST));
    }

    @Test
    void grade_ordersStrongestFirst() {
        assertTrue(FairnessGrade.ORDER_FAIR.atLeast(FairnessGrade.LEAD_FAIR));
        assertFalse(FairnessGrade.LEAD_FAIR.atLeast(FairnessGrade.SEAT_FAIR));
        assertTrue(FairnessGrade.UNFAIR.atLeast(FairnessGrade.UNFAIR));
    }
}
