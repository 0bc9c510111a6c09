package org.precedence.game.bots;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.precedence.game.MoveChooser;
import org.precedence.game.rules.Boat;
import org.precedence.game.rules.GameState;
import org.precedence.game.rules.Island;
import org.precedence.game.rules.Move;
import org.precedence.game.rules.Rules;

/**
 * A greedy bot. In order: it concedes (retires) once it cannot reach the leader's glow even by
 * lighting every dark lantern; lights the dark lantern it lies at; gathers when its hold is
 * empty; otherwise sails 1 to 3 places toward the brightest dark lantern in reach, preferring
 * one no other boat lies at (that boat may light it first). Close choices are decided by draws
 * from a generator seeded with (bot seed, round, seat), so the bot is deterministic yet seats
 * with the same view do not all act alike.
 */
final class RacerBot implements MoveChooser {
    private static final long ROUND_MIX = 0x9E3779B97F4A7C15L;
    private static final long SEAT_MIX = 0xC2B2AE3D27D4EB4FL;

    private final long seed;

    RacerBot(long seed) {
        this.seed = seed;
    }

    @Override
    public Move choose(GameState state, int seat, int round) {
        Boat me = state.boat(seat);
        SplittableRandom random = new SplittableRandom(seed ^ (round * ROUND_MIX) ^ ((seat + 1) * SEAT_MIX));
        if (cannotCatchUp(state, seat)) {
            return new Move.Retire();
        }
        Move light = new Move.Light();
        if (Rules.refusal(state, seat, light).isEmpty()) {
            return light;
        }
        if (me.oil() == 0) {
            return new Move.Gather();
        }
        List<Integer> best = new ArrayList<>();
        int bestValue = Integer.MIN_VALUE;
        for (int d = Move.Sail.MIN; d <= Move.Sail.MAX; d++) {
            int value = valueOf(state, seat, state.board().sail(me.position(), d), random);
            if (value > bestValue) {
                bestValue = value;
                best.clear();
            }
            if (value == bestValue) {
                best.add(d);
            }
        }
        if (bestValue <= 0 && me.oil() < Rules.MAX_OIL && random.nextInt(3) == 0) {
            // Nothing worth reaching: sometimes fill the hold instead of searching.
            return new Move.Gather();
        }
        return new Move.Sail(best.get(random.nextInt(best.size())));
    }

    /**
     * For a dark lantern: twice its glow, two less if a rival lies there, plus a draw of 0 to 3,
     * so that boats with the same view (all of them, in the harbour) spread out instead of
     * racing in a pack. 0 for a place with nothing to light.
     */
    private static int valueOf(GameState state, int seat, int position, SplittableRandom random) {
        Island island = state.board().place(position);
        if (!island.hasLantern() || state.owner(position) != GameState.DARK) {
            return 0;
        }
        boolean rivalThere = state.boats().stream()
                .anyMatch(b -> b.active() && b.seat() != seat && b.position() == position);
        return 2 * island.glow() - (rivalThere ? 2 : 0) + random.nextInt(4);
    }

    private static boolean cannotCatchUp(GameState state, int seat) {
        if (state.activeSeats().size() <= 1) {
            return false;
        }
        int leader = 0;
        for (int other : state.activeSeats()) {
            if (other != seat) {
                leader = Math.max(leader, state.score(other));
            }
        }
        return state.score(seat) + state.darkGlow() < leader;
    }
}
