package org.precedence.game.rules;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * How a game ended.
 *
 * @param winner    the winning seat
 * @param ending    why the game ended
 * @param standings every seat's final line, best first (boats that left come last, by seat)
 */
public record Outcome(int winner, Ending ending, List<Standing> standings) {
    public Outcome {
        Objects.requireNonNull(ending, "ending");
        standings = List.copyOf(standings);
    }

    /**
     * Decides the winner among the boats still in: most glow; then most lanterns; then most
     * oil left; then whoever acted earliest in the final round. The last tie-break is the
     * fair die roll itself, so there is always exactly one winner and no seat is favoured.
     *
     * @param state          the final position
     * @param ending         why the game ended
     * @param lastRoundOrder seats in the acting order of the final round
     * @throws IllegalArgumentException if no boat still in the game appears in the order
     */
    public static Outcome decide(GameState state, Ending ending, List<Integer> lastRoundOrder) {
        List<Standing> active = new ArrayList<>();
        List<Standing> left = new ArrayList<>();
        for (Boat b : state.boats()) {
            Standing s = new Standing(b.seat(), b.name(), state.score(b.seat()), state.lanterns(b.seat()),
                    b.oil(), b.active());
            (b.active() ? active : left).add(s);
        }
        for (Standing s : active) {
            if (!lastRoundOrder.contains(s.seat())) {
                throw new IllegalArgumentException(s.name() + " is still in but not in the final round's order");
            }
        }
        if (active.isEmpty()) {
            throw new IllegalArgumentException("no boat is left in the game");
        }
        Comparator<Standing> best = Comparator.comparingInt(Standing::score).reversed()
                .thenComparing(Comparator.comparingInt(Standing::lanterns).reversed())
                .thenComparing(Comparator.comparingInt(Standing::oil).reversed())
                .thenComparingInt(s -> lastRoundOrder.indexOf(s.seat()));
        active.sort(best);
        List<Standing> all = new ArrayList<>(active);
        all.addAll(left);
        return new Outcome(active.get(0).seat(), ending, all);
    }

    /** Returns the winner's line. */
    public Standing winning() {
        return standings.get(0);
    }
}
