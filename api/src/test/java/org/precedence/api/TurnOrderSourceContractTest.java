package org.precedence.api;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.mockito.ArgumentMatchers.anyInt;
import static org.mockito.ArgumentMatchers.anyLong;
import static org.mockito.Mockito.CALLS_REAL_METHODS;
import static org.mockito.Mockito.mock;
import static org.mockito.Mockito.never;
import static org.mockito.Mockito.verify;
import static org.mockito.Mockito.when;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Pins what an engine may rely on when it calls {@link TurnOrderSource#order} in place of a
 * shuffle: the defaults ask {@code roll} exactly once with the list's size, map indices to the
 * engine's own objects, never touch the list, and reject bad input before rolling.
 */
class TurnOrderSourceContractTest {

    static RoundResult result(long round, int... order) {
        List<PlayerRoll> rolls = new ArrayList<>();
        int[] position = new int[order.length];
        for (int p = 0; p < order.length; p++) {
            position[order[p]] = p;
        }
        for (int d = 0; d < order.length; d++) {
            rolls.add(new PlayerRoll(d, String.valueOf((char) ('A' + d)), BigInteger.valueOf(d),
                    BigInteger.valueOf(10L * position[d] + 1), position[d]));
        }
        return new RoundResult(round, Arrays.stream(order).boxed().toList(), rolls, FairnessGrade.ORDER_FAIR, "mock-set");
    }

    private static TurnOrderSource mockSource() {
        return mock(TurnOrderSource.class, CALLS_REAL_METHODS);
    }

    @Test
    void order_mapsTheRolledIndicesToTheEnginesPlayers() {
        TurnOrderSource source = mockSource();
        when(source.roll(7, 3)).thenReturn(result(7, 2, 0, 1));
        List<String> players = new ArrayList<>(List.of("kestrel", "marten", "vole"));
        List<String> ordered = source.order(7, players);
        assertEquals(List.of("vole", "kestrel", "marten"), ordered);
        assertEquals(List.of("kestrel", "marten", "vole"), players, "the engine's list is untouched");
        verify(source).roll(7, 3);
        assertThrows(UnsupportedOperationException.class, () -> ordered.add("stoat"));
    }

    @Test
    void order_singlePlayerNeverRolls() {
        TurnOrderSource source = mockSource();
        assertEquals(List.of("wren"), source.order(4, List.of("wren")));
        verify(source, never()).roll(anyLong(), anyInt());
        assertThrows(IllegalArgumentException.class, () -> source.order(-1, List.of("wren")));
    }

    @Test
    void order_rejectsBadInputBeforeRolling() {
        TurnOrderSource source = mockSource();
        NullPointerException npe = assertThrows(NullPointerException.class, () -> source.order(0, null));
        assertEquals("players", npe.getMessage());
        npe = assertThrows(NullPointerException.class, () -> source.order(0, Arrays.asList("a", null)));
        assertEquals("player at index 1", npe.getMessage());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> source.order(0, List.of()));
        assertEquals("players must not be empty", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> source.order(0, List.of("a", "b", "a")));
        assertEquals("duplicate player at index 2: a", e.getMessage());
        verify(source, never()).roll(anyLong(), anyInt());
    }

    @Test
    void order_negativeRoundIsReportedByRoll() {
        TurnOrderSource source = mockSource();
        when(source.roll(-2, 2)).thenThrow(new IllegalArgumentException("round must be >= 0, got -2"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> source.order(-2, List.of("a", "b")));
        assertTrue(e.getMessage().contains("-2"));
    }

    @Test
    void orderIndices_followsRoll() {
        TurnOrderSource source = mockSource();
        when(source.roll(3, 4)).thenReturn(result(3, 1, 3, 0, 2));
        assertArrayEquals(new int[] {1, 3, 0, 2}, source.orderIndices(3, 4));
        assertArrayEquals(new int[] {0}, source.orderIndices(3, 1));
        assertThrows(IllegalArgumentException.class, () -> source.orderIndices(-1, 1));
    }

    @Test
    void provider_openWithSeedUsesTheDefaultSpec() {
        TurnOrderProvider provider = mock(TurnOrderProvider.class, CALLS_REAL_METHODS);
        TurnOrderSource source = mockSource();
        SessionSeed seed = SessionSeed.fromText("contract");
        when(provider.open(SessionSpec.of(seed))).thenReturn(source);
        assertEquals(source, provider.open(seed));
        verify(provider).open(SessionSpec.of(seed));
    }
}
