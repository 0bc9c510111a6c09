package org.precedence.cli.simulate;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.precedence.api.SessionSeed;

/**
 * The ordinary-dice peer: every player throws one plain die with {@code sides} faces
 * (1..sides); if any two show the same value, all throw again. The lowest value acts first.
 * Each session seeds one xoroshiro128++ generator (Apache Commons RNG) from a seed derived
 * from its session seed, so the three columns of a comparison never share random numbers.
 */
final class RerollDiceSupply implements OrderSupply {
    private final SessionSeed master;
    private final int sides;

    RerollDiceSupply(SessionSeed master, int sides) {
        if (sides < 2) {
            throw new IllegalArgumentException("dice need at least 2 sides, got " + sides);
        }
        this.master = master;
        this.sides = sides;
    }

    /** Returns the side count of the dice. */
    int sides() {
        return sides;
    }

    @Override
    public String label() {
        return "d" + sides + " re-roll";
    }

    @Override
    public SessionOrders open(long session, int players) {
        if (players > sides) {
            throw new IllegalArgumentException(players + " players cannot all throw different values on "
                    + sides + "-sided dice; use --compare-sides " + players + " or more");
        }
        long[] seed = SessionSeeds.twoLongs(SessionSeed.fromText(
                SessionSeeds.of(master, session).toHex() + "/plain-dice"));
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        int[] value = new int[players];
        return (round, out) -> {
            int throwsTaken = 0;
            boolean distinct;
            do {
                throwsTaken++;
                for (int p = 0; p < players; p++) {
                    value[p] = rng.nextInt(sides);
                }
                distinct = allDistinct(value, players);
            } while (!distinct);
            // Insertion sort of the players by value: n is small and values are distinct.
            for (int p = 0; p < players; p++) {
                int q = p;
                while (q > 0 && value[out[q - 1]] > value[p]) {
                    out[q] = out[q - 1];
                    q--;
                }
                out[q] = p;
            }
            return throwsTaken;
        };
    }

    private static boolean allDistinct(int[] value, int players) {
        for (int i = 1; i < players; i++) {
            for (int j = 0; j < i; j++) {
                if (value[i] == value[j]) {
                    return false;
                }
            }
        }
        return true;
    }
}
