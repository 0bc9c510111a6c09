package org.precedence.runtime.replay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.runtime.provider.DiceSession;
import org.precedence.runtime.provider.TestSets;
import org.precedence.runtime.randomness.RollGenerator;

class ReplayTest {
    private static final SessionSeed SEED = SessionSeed.fromText("lantern harbour evening");
    private static final Replayer REPLAYER = new Replayer(TestSets.INSTANCE);

    @TempDir
    Path dir;

    /** Eight rounds of an invented game in which a fourth crew member joins at round 4. */
    static SessionLog recorded(RandomnessMode mode, OrderRule rule) {
        DiceSession session = DiceSession.open(new SessionSpec(SEED, mode, rule, RankingConvention.LOWEST_FIRST),
                TestSets.INSTANCE);
        SessionRecorder recorder = new SessionRecorder(session);
        for (long k = 0; k < 8; k++) {
            List<String> roster = k < 4 ? List.of("Quill", "Bramble", "Tamsin")
                    : List.of("Quill", "Bramble", "Tamsin", "Oriel");
            recorder.play(k, roster);
        }
        return recorder.log(true);
    }

    private static String edit(String json, String from, String to) {
        assertTrue(json.contains(from), "fixture contains " + from);
        return json.replaceFirst(java.util.regex.Pattern.quote(from), java.util.regex.Matcher.quoteReplacement(to));
    }

    @Test
    void replay_acceptsAnHonestLogAfterWriteAndRead() throws IOException {
        for (RandomnessMode mode : RandomnessMode.values()) {
            for (OrderRule rule : OrderRule.values()) {
                SessionLog log = recorded(mode, rule);
                Path file = dir.resolve("session-" + mode + "-" + rule + ".json");
                SessionLogFiles.write(file, log);
                SessionLog back = SessionLogFiles.read(file);
                assertEquals(log, back);
                ReplayReport report = REPLAYER.verify(back, Optional.empty());
                assertTrue(report.ok(), () -> report.mismatch().get().describe());
                assertEquals(8, report.roundsChecked());
            }
        }
    }

    @Test
    void replay_reportsTheFirstEditedFace() {
        SessionLog log = recorded(RandomnessMode.FAST, OrderRule.FRESH_EACH_ROUND);
        LoggedRound r5 = log.rounds().get(5);
        String face = r5.faces().get(2);
        String bumped = new java.math.BigInteger(face).add(java.math.BigInteger.ONE).toString();
        List<LoggedRound> rounds = new java.util.ArrayList<>(log.rounds());
        List<String> faces = new java.util.ArrayList<>(r5.faces());
        faces.set(2, bumped);
        rounds.set(5, new LoggedRound(5, r5.roster(), r5.setId(), r5.setSha256(), faces, r5.order()));
        SessionLog tampered = new SessionLog(1, log.algorithm(), log.mode(), log.rule(), log.convention(),
                log.commitment(), log.seed(), rounds);
        ReplayReport report = REPLAYER.verify(tampered, Optional.empty());
        Mismatch m = report.mismatch().orElseThrow();
        assertEquals(5, report.roundsChecked());
        assertEquals(new Mismatch(5, "faces", 2, -1, face, bumped), m);
        assertEquals("round 5: faces of player 2: expected " + face + ", found " + bumped, m.describe());
    }

    @Test
    void replay_reportsAnEditedOrder() {
        SessionLog log = recorded(RandomnessMode.SECURE, OrderRule.BALANCED_LEAD);
        LoggedRound r3 = log.rounds().get(3);
        List<Integer> swapped = new java.util.ArrayList<>(r3.order());
        java.util.Collections.swap(swapped, 0, 1);
        List<LoggedRound> rounds = new java.util.ArrayList<>(log.rounds());
        rounds.set(3, new LoggedRound(3, r3.roster(), r3.setId(), r3.setSha256(), r3.faces(), swapped));
        SessionLog tampered = new SessionLog(1, log.algorithm(), log.mode(), log.rule(), log.convention(),
                log.commitment(), log.seed(), rounds);
        Mismatch m = REPLAYER.verify(tampered, Optional.empty()).mismatch().orElseThrow();
        assertEquals(3, m.round());
        assertEquals("order", m.field());
        assertEquals(0, m.position());
        assertEquals(r3.order().get(0), m.player());
    }

    @Test
    void replay_detectsWrongSetHashCommitmentAndMode() {
        String json = SessionLogFiles.toJson(recorded(RandomnessMode.FAST, OrderRule.SNAKE));
        SessionLog log = SessionLogFiles.fromJson(json);
        String hash = log.rounds().get(0).setSha256();
        Mismatch m = REPLAYER.verify(SessionLogFiles.fromJson(edit(json, hash, "0".repeat(64))), Optional.empty())
                .mismatch().orElseThrow();
        assertEquals("setSha256", m.field());
        assertEquals(0, m.round());

        m = REPLAYER.verify(SessionLogFiles.fromJson(edit(json, log.commitment(), "1".repeat(64))), Optional.empty())
                .mismatch().orElseThrow();
        assertEquals("commitment", m.field());

        m = REPLAYER.verify(SessionLogFiles.fromJson(edit(json, "\"mode\": \"fast\"", "\"mode\": \"secure\"")),
                Optional.empty()).mismatch().orElseThrow();
        assertEquals("mode", m.field());
    }

    @Test
    void replay_commitmentOnlyLogNeedsTheRevealedSeed() {
        SessionLog published = recorded(RandomnessMode.FAST, OrderRule.FRESH_EACH_ROUND).commitmentOnly();
        String json = SessionLogFiles.toJson(published);
        assertFalse(json.contains(SEED.toHex()), "the seed is not published before the reveal");
        SessionLog back = SessionLogFiles.fromJson(json);
        MalformedLogException e = assertThrows(MalformedLogException.class,
                () -> REPLAYER.verify(back, Optional.empty()));
        assertTrue(e.getMessage().contains("only the commitment"));
        assertTrue(REPLAYER.verify(back, Optional.of(SEED)).ok());
        Mismatch m = REPLAYER.verify(back, Optional.of(SessionSeed.fromText("a guess"))).mismatch().orElseThrow();
        assertEquals("commitment", m.field());
    }

    @Test
    void fromJson_rejectsMalformedLogsWithAClearMessage() {
        String json = SessionLogFiles.toJson(recorded(RandomnessMode.FAST, OrderRule.FRESH_EACH_ROUND));
        assertMalformed(json.substring(0, json.length() / 2), "malformed JSON");
        assertMalformed(json + "{}", "text follows");
        assertMalformed("[]", "must be an object");
        assertMalformed("", "the text is empty");
        assertMalformed("\"just text\"", "must be an object");
        assertMalformed(edit(json, "\"formatVersion\": 1", "\"formatVersion\": 9"), "version 9 is not supported");
        assertMalformed(edit(json, "precedence-session-log", "something-else"), "format is 'something-else'");
        assertMalformed(edit(json, "\"rule\"", "\"rules\""), "missing field 'rule'");
        assertMalformed(edit(json, "\"round\": 2", "\"round\": -2"), "must be a whole number");
        assertMalformed(edit(json, "\"round\": 2", "\"round\": 2.5"), "must be a whole number");
        assertMalformed(edit(json, "\"convention\": \"LOWEST_FIRST\"", "\"convention\": \"SIDEWAYS\""),
                "allowed: [lowest_first, highest_first]");
        SessionLog log = SessionLogFiles.fromJson(json);
        String face = log.rounds().get(0).faces().get(0);
        assertMalformed(edit(json, "\"" + face + "\"", "\"x" + face + "\""), "must be a decimal number");
        assertMalformed(edit(json, "\"algorithm\": \"precedence-roll-v3/philox4x64\"", "\"algorithm\": 7"),
                "'algorithm' must be a string");
    }

    @Test
    void replay_v1LogReplaysWithV1AndIsNotAV3Log() {
        for (OrderRule rule : OrderRule.values()) {
            DiceSession v1 = DiceSession.open(new SessionSpec(SEED, RandomnessMode.FAST, rule,
                    RankingConvention.LOWEST_FIRST), TestSets.INSTANCE, RollGenerator.FAST_V1_ID);
            SessionRecorder recorder = new SessionRecorder(v1);
            for (long k = 0; k < 8; k++) {
                recorder.play(k, List.of("Quill", "Bramble", "Tamsin"));
            }
            SessionLog log = SessionLogFiles.fromJson(SessionLogFiles.toJson(recorder.log(true)));
            assertEquals(RollGenerator.FAST_V1_ID, log.algorithm());
            ReplayReport report = REPLAYER.verify(log, Optional.empty());
            assertTrue(report.ok(), () -> report.mismatch().get().describe());
            assertEquals(8, report.roundsChecked());
            // The same log relabelled as v3 no longer matches: the id really selects the algorithm.
            SessionLog relabelled = SessionLogFiles.fromJson(SessionLogFiles.toJson(recorder.log(true))
                    .replace(RollGenerator.FAST_V1_ID, RollGenerator.FAST_ID));
            assertFalse(REPLAYER.verify(relabelled, Optional.empty()).ok(), rule.toString());
        }
    }

    /**
     * A v2 log of 10 players (a constructed set, where v3 draws differently) replays with v2;
     * relabelled as v3 it fails, while a 3-player round (single-digit faces) is the same under both.
     */
    @Test
    void replay_v2LogOfConstructedSetReplaysWithV2Only() {
        org.precedence.runtime.source.SetSource standard = org.precedence.runtime.provider.FairDiceProvider
                .standardSets();
        Replayer replayer = new Replayer(standard);
        DiceSession v2 = DiceSession.open(SessionSpec.of(SEED), standard, RollGenerator.FAST_V2_ID);
        List<String> ten = List.of("Quill", "Bramble", "Tamsin", "Orrin", "Pell", "Wick", "Sorrel", "Juno", "Fable",
                "Lark");
        SessionRecorder recorder = new SessionRecorder(v2);
        for (long k = 0; k < 6; k++) {
            recorder.play(k, ten);
        }
        String json = SessionLogFiles.toJson(recorder.log(true));
        ReplayReport report = replayer.verify(SessionLogFiles.fromJson(json), Optional.empty());
        assertTrue(report.ok(), () -> report.mismatch().get().describe());
        assertEquals(6, report.roundsChecked());
        SessionLog asV3 = SessionLogFiles.fromJson(json.replace(RollGenerator.FAST_V2_ID, RollGenerator.FAST_ID));
        assertFalse(replayer.verify(asV3, Optional.empty()).ok());

        SessionRecorder three = new SessionRecorder(v2);
        three.play(0, List.of("Quill", "Bramble", "Tamsin"));
        String small = SessionLogFiles.toJson(three.log(true)).replace(RollGenerator.FAST_V2_ID, RollGenerator.FAST_ID);
        assertTrue(replayer.verify(SessionLogFiles.fromJson(small), Optional.empty()).ok());
    }

    @Test
    void verify_rejectsUnknownAlgorithmAndBadSizes() {
        String json = SessionLogFiles.toJson(recorded(RandomnessMode.FAST, OrderRule.FRESH_EACH_ROUND));
        SessionLog unknown = SessionLogFiles.fromJson(edit(json, "precedence-roll-v3/philox4x64", "precedence-roll-v9/x"));
        MalformedLogException bad = assertThrows(MalformedLogException.class,
                () -> REPLAYER.verify(unknown, Optional.empty()));
        assertTrue(bad.getMessage().contains("unknown algorithm 'precedence-roll-v9/x'"), bad.getMessage());
        assertTrue(bad.getMessage().contains(RollGenerator.FAST_V1_ID), bad.getMessage());
        SessionLog shortRoster = SessionLogFiles.fromJson(edit(json, "\"Quill\",", ""));
        MalformedLogException e = assertThrows(MalformedLogException.class,
                () -> REPLAYER.verify(shortRoster, Optional.empty()));
        assertTrue(e.getMessage().startsWith("round 0: roster has 2 players"), e.getMessage());
    }

    private static void assertMalformed(String json, String expectedPart) {
        MalformedLogException e = assertThrows(MalformedLogException.class, () -> SessionLogFiles.fromJson(json));
        assertTrue(e.getMessage().contains(expectedPart), e.getMessage());
    }

    @Test
    void write_replacesAtomicallyAndLeavesNoTemporaryFile() throws IOException {
        Path file = dir.resolve("log.json");
        Files.writeString(file, "old");
        SessionLog log = recorded(RandomnessMode.FAST, OrderRule.SNAKE);
        SessionLogFiles.write(file, log);
        assertEquals(log, SessionLogFiles.read(file));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(file), files.toList());
        }
    }

    @Test
    void recorder_rejectsBadRosters() {
        SessionRecorder recorder = new SessionRecorder(DiceSession.open(SessionSpec.of(SEED), TestSets.INSTANCE));
        assertThrows(IllegalArgumentException.class, () -> recorder.play(0, List.of()));
        assertThrows(IllegalArgumentException.class, () -> recorder.play(0, List.of("Wick", "Wick")));
        assertThrows(NullPointerException.class, () -> recorder.play(0, java.util.Arrays.asList("Wick", null)));
        assertThrows(IllegalArgumentException.class, () -> recorder.play(-1, List.of("Wick", "Sorrel")));
        assertEquals(0, recorder.log(true).rounds().size());
    }
}
