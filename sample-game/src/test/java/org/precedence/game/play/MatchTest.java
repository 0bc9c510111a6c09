package org.precedence.game.play;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.mockito.ArgumentMatchers.any;
import static org.mockito.ArgumentMatchers.anyInt;
import static org.mockito.ArgumentMatchers.anyList;
import static org.mockito.ArgumentMatchers.anyLong;
import static org.mockito.Mockito.inOrder;
import static org.mockito.Mockito.mock;
import static org.mockito.Mockito.never;
import static org.mockito.Mockito.times;
import static org.mockito.Mockito.verify;
import static org.mockito.Mockito.when;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.mockito.InOrder;
import org.precedence.api.FairnessGrade;
import org.precedence.api.PlayerRoll;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RoundResult;
import org.precedence.api.TurnOrderSource;
import org.precedence.game.GameSetup;
import org.precedence.game.MoveChooser;
import org.precedence.game.Seat;
import org.precedence.game.fake.ShuffleProvider;
import org.precedence.game.log.GameRecord;
import org.precedence.game.log.GameRecord.MoveEntry;
import org.precedence.game.log.GameRecord.RoundEntry;
import org.precedence.game.rules.GameState;
import org.precedence.game.rules.MalformedMoveException;
import org.precedence.game.rules.Move;
import org.precedence.game.rules.MoveParser;
import org.precedence.game.rules.Rules;

class MatchTest {

    private static final String SEED = "veyra-dusk";

    /** A mock that answers like the test provider, so Mockito can count and check the calls. */
    private static TurnOrderSource countingSource(GameSetup setup) {
        TurnOrderSource real = new ShuffleProvider().open(setup.sessionSpec());
        TurnOrderSource source = mock(TurnOrderSource.class);
        when(source.roll(anyLong(), anyInt()))
                .thenAnswer(call -> real.roll(call.getArgument(0), call.getArgument(1)));
        when(source.spec()).thenReturn(setup.sessionSpec());
        return source;
    }

    /** Records the live roster (seats still in) at the moment each round is rolled. */
    private static final class RosterWatch implements TableListener {
        final List<List<Integer>> liveAtRoll = new ArrayList<>();
        final List<List<Integer>> rolledFor = new ArrayList<>();

        @Override
        public void roundStarted(RoundStart start, GameState state) {
            liveAtRoll.add(state.activeSeats());
            rolledFor.add(start.roster());
        }
    }

    private static GameRecord playBots(GameSetup setup, TurnOrderSource source, TableListener listener) {
        List<MoveChooser> choosers = Match.choosers(setup, setup.sessionSpec().seed(), seat -> {
            throw new AssertionError("no humans here");
        });
        return new Match(setup, source, "test-shuffle", choosers, listener).play();
    }

    @Test
    void play_rollsSourceExactlyOncePerRoundWithTheLiveRoster() {
        GameSetup setup = GameSetup.of(5, 5, SEED, RandomnessMode.FAST, 12, 0);
        TurnOrderSource source = countingSource(setup);
        RosterWatch watch = new RosterWatch();
        GameRecord record = playBots(setup, source, watch);

        int rounds = record.rounds().size();
        assertTrue(rounds >= 2, "a game lasts more than one round");
        InOrder inOrder = inOrder(source);
        for (RoundEntry r : record.rounds()) {
            inOrder.verify(source).roll(r.round() - 1L, r.roster().size());
        }
        verify(source, times(rounds)).roll(anyLong(), anyInt());
        verify(source, never()).order(anyLong(), anyList());
        assertEquals(watch.liveAtRoll, watch.rolledFor);
        for (int i = 0; i < rounds; i++) {
            assertEquals(watch.liveAtRoll.get(i), record.rounds().get(i).roster());
        }
    }

    @Test
    void play_botMadeToLeave_laterRoundsRolledForTheRest() {
        GameSetup setup = GameSetup.of(5, 5, SEED, RandomnessMode.FAST, 12, 2);
        TurnOrderSource source = countingSource(setup);
        RosterWatch watch = new RosterWatch();
        GameRecord record = playBots(setup, source, watch);

        RoundEntry second = record.rounds().get(1);
        assertEquals(1, second.departures().size());
        int left = second.departures().get(0);
        assertEquals(List.of(0, 1, 2, 3, 4), second.roster());
        RoundEntry third = record.rounds().get(2);
        assertFalse(third.roster().contains(left));
        assertEquals(4, third.roster().size());
        verify(source).roll(0L, 5);
        verify(source).roll(1L, 5);
        verify(source).roll(2L, 4);
        verify(source, times(record.rounds().size())).roll(anyLong(), anyInt());
        for (int i = 2; i < record.rounds().size(); i++) {
            assertFalse(record.rounds().get(i).order().contains(left), "round " + (i + 1));
            assertEquals(watch.liveAtRoll.get(i), record.rounds().get(i).roster());
        }
        assertFalse(record.result().standings().stream().filter(s -> s.seat() == left).findFirst().get().active());
    }

    @Test
    void play_rollShownToListenerBeforeAnyMoveOfTheRound() {
        GameSetup setup = GameSetup.of(3, 3, SEED, RandomnessMode.FAST, 4, 0);
        List<String> events = new ArrayList<>();
        playBots(setup, countingSource(setup), new TableListener() {
            @Override
            public void roundStarted(RoundStart start, GameState state) {
                events.add("roll " + start.round());
            }

            @Override
            public void moved(int round, int seat, Move move, GameState before, GameState after) {
                events.add("move " + round);
            }
        });
        int lastRolled = 0;
        for (String e : events) {
            int round = Integer.parseInt(e.substring(e.indexOf(' ') + 1));
            if (e.startsWith("roll")) {
                lastRolled = round;
            } else {
                assertEquals(lastRolled, round, "a move of round " + round + " came before its roll");
            }
        }
    }

    /** A source that always rolls the given order: lets a test decide who acts first. */
    private static TurnOrderSource fixedOrder(GameSetup setup, List<Integer> order) {
        TurnOrderSource source = mock(TurnOrderSource.class);
        when(source.spec()).thenReturn(setup.sessionSpec());
        when(source.roll(anyLong(), anyInt())).thenAnswer(call -> {
            long round = call.getArgument(0);
            int n = call.getArgument(1);
            List<PlayerRoll> rolls = new ArrayList<>();
            for (int player = 0; player < n; player++) {
                int pos = order.indexOf(player);
                rolls.add(new PlayerRoll(player, String.valueOf((char) ('A' + player)), BigInteger.ZERO,
                        BigInteger.valueOf(10L * pos + player + 1), pos));
            }
            return new RoundResult(round, order.subList(0, n), rolls, FairnessGrade.ORDER_FAIR, "fixed");
        });
        return source;
    }

    private static MoveChooser script(String... moves) {
        List<String> left = new ArrayList<>(List.of(moves));
        return (state, seat, round) -> {
            try {
                return MoveParser.parse(left.isEmpty() ? "gather" : left.remove(0));
            } catch (MalformedMoveException e) {
                throw new AssertionError(e);
            }
        };
    }

    /** Sails 1 in round 1, then lights if the rules allow it, else gathers. */
    private static final MoveChooser RACER = (state, seat, round) -> {
        if (round == 1) {
            return new Move.Sail(1);
        }
        Move light = new Move.Light();
        return Rules.refusal(state, seat, light).isEmpty() ? light : new Move.Gather();
    };

    @Test
    void play_twoBoatsRaceForOneLantern_whoeverTheRollPutsFirstLightsIt() {
        GameSetup setup = new GameSetup(List.of(new Seat(0, "Saltmoth", false), new Seat(1, "Tidewhistle", false)),
                SEED, RandomnessMode.FAST, 2, 0);
        // Both reach Cindermouth (glow 1) in round 1 and race for it in round 2.
        for (List<Integer> order : List.of(List.of(1, 0), List.of(0, 1))) {
            GameRecord record = new Match(setup, fixedOrder(setup, order), "fixed", List.of(RACER, RACER),
                    TableListener.NONE).play();
            int first = order.get(0);
            assertEquals(first, record.result().winner(), "order " + order);
            assertEquals(1, record.result().standings().get(0).score());
            assertEquals(List.of(new MoveEntry(first, "light"), new MoveEntry(1 - first, "gather")),
                    record.rounds().get(1).moves());
        }
    }

    @Test
    void play_chooserHandsInIllegalMove_refusedWithRoundAndReason() {
        GameSetup setup = new GameSetup(List.of(new Seat(0, "Saltmoth", false), new Seat(1, "Tidewhistle", false)),
                SEED, RandomnessMode.FAST, 3, 0);
        List<MoveChooser> choosers = List.of(script("light"), script("sail 1"));
        Match match = new Match(setup, fixedOrder(setup, List.of(0, 1)), "fixed", choosers, TableListener.NONE);
        RefusedMoveException e = assertThrows(RefusedMoveException.class, match::play);
        assertEquals("round 1: Saltmoth's move 'light' is refused: Lowmarket Harbour has no lantern to light",
                e.getMessage());
    }

    @Test
    void play_sourceAnswersForWrongCount_stopsWithClearError() {
        GameSetup setup = GameSetup.of(3, 3, SEED, RandomnessMode.FAST, 3, 0);
        TurnOrderSource real = new ShuffleProvider().open(setup.sessionSpec());
        TurnOrderSource broken = mock(TurnOrderSource.class);
        when(broken.roll(anyLong(), anyInt())).thenAnswer(call -> real.roll(call.getArgument(0), 2));
        Match match = new Match(setup, broken, "broken", Match.choosers(setup, setup.sessionSpec().seed(), s -> null),
                TableListener.NONE);
        IllegalStateException e = assertThrows(IllegalStateException.class, match::play);
        assertTrue(e.getMessage().contains("for 2 players when asked for round 0 for 3"), e.getMessage());
    }

    @Test
    void open_tableLargerThanProviderServes_rejected() {
        GameSetup setup = GameSetup.of(6, 6, SEED, RandomnessMode.FAST, 12, 0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Match.open(setup, new ShuffleProvider(5), s -> null, TableListener.NONE));
        assertEquals("the turn-order provider test-shuffle serves at most 5 players, the table has 6", e.getMessage());
    }

    @Test
    void play_neverAsksForTheOrderOfAListNorRollsForOne() {
        GameSetup setup = GameSetup.of(2, 2, SEED, RandomnessMode.SECURE, 12, 0);
        TurnOrderSource source = countingSource(setup);
        playBots(setup, source, TableListener.NONE);
        verify(source, never()).order(anyLong(), any());
        verify(source, never()).roll(anyLong(), org.mockito.ArgumentMatchers.intThat(n -> n < 2));
    }

    @Test
    void play_boatRetiresMidRound_nextRoundRolledForTheRest() {
        GameSetup setup = GameSetup.of(4, 0, SEED, RandomnessMode.FAST, 3, 0);
        TurnOrderSource source = countingSource(setup);
        MoveChooser people = (state, seat, round) -> seat == 2 && round == 1 ? new Move.Retire() : new Move.Sail(1);
        RosterWatch watch = new RosterWatch();
        GameRecord record = new Match(setup, source, "test-shuffle", List.of(people, people, people, people), watch)
                .play();
        InOrder inOrder = inOrder(source);
        inOrder.verify(source).roll(0L, 4);
        inOrder.verify(source).roll(1L, 3);
        inOrder.verify(source).roll(2L, 3);
        verify(source, times(3)).roll(anyLong(), anyInt());
        assertEquals(List.of(List.of(0, 1, 2, 3), List.of(0, 1, 3), List.of(0, 1, 3)), watch.rolledFor);
        assertEquals(watch.liveAtRoll, watch.rolledFor);
    }

    /**
     * Exact check of the claim that a boat retiring mid-round leaves the others' order fair:
     * over all 4! = 24 equally likely orders of four boats, with one boat retiring at its turn,
     * the other three act in each of their 3! = 6 relative orders exactly 24 / 6 = 4 times
     * (first principles: restricting a uniform permutation to a subset is uniform).
     */
    @Test
    void play_retireMidRound_remainingOrderStillUniform() {
        GameSetup setup = GameSetup.of(4, 0, SEED, RandomnessMode.FAST, 1, 0);
        MoveChooser people = (state, seat, round) -> seat == 1 ? new Move.Retire() : new Move.Sail(2);
        Map<List<Integer>, Integer> counts = new HashMap<>();
        for (List<Integer> order : permutations(List.of(0, 1, 2, 3))) {
            GameRecord record = new Match(setup, fixedOrder(setup, order), "fixed", List.of(people, people, people,
                    people), TableListener.NONE).play();
            List<Integer> others = record.rounds().get(0).moves().stream().filter(m -> !m.move().equals("retire"))
                    .map(MoveEntry::seat).toList();
            counts.merge(others, 1, Integer::sum);
        }
        assertEquals(6, counts.size());
        assertTrue(counts.values().stream().allMatch(c -> c == 4), counts.toString());
    }

    private static List<List<Integer>> permutations(List<Integer> items) {
        if (items.isEmpty()) {
            return List.of(List.of());
        }
        List<List<Integer>> out = new ArrayList<>();
        for (Integer first : items) {
            List<Integer> rest = new ArrayList<>(items);
            rest.remove(first);
            for (List<Integer> tail : permutations(rest)) {
                List<Integer> p = new ArrayList<>();
                p.add(first);
                p.addAll(tail);
                out.add(p);
            }
        }
        return out;
    }
}
