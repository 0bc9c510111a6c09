package org.precedence.runtime.construction;

import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Objects;
import java.util.StringJoiner;
import org.precedence.runtime.dice.Word;

/**
 * A plan of the layered construction: a starting word and the levels applied to it, first level
 * first. Level i must lift depth {@code start.depth + i} by one, so after the last level the
 * word has subset depth n and is order-fair.
 *
 * <p>Why a level lifts depth t to t+1: count a (t+1)-pattern in the concatenation of blocks.
 * Occurrences spread over two or more blocks use pieces of length ≤ t, whose counts in every
 * block are m^j/j! whatever the letters (each block has depth t and m faces per die), so they
 * add up to the same total for every pattern. Occurrences inside one block σ(W) count
 * N_W(σ⁻¹w); summed over a family uniform on ordered (t+1)-tuples that is the same multiple of
 * Σ_u N_W(u) for every w. Reversal doubling is the special case checked in {@link Level#proof()}.
 */
public final class Construction {
    private final int players;
    private final StartingWord start;
    private final List<Level> levels;

    /**
     * @throws IllegalArgumentException if a level does not lift the depth by exactly one, the
     *                                  levels do not reach depth n, or the point counts differ
     */
    public Construction(StartingWord start, List<Level> levels) {
        this.start = Objects.requireNonNull(start, "start");
        this.levels = List.copyOf(levels);
        this.players = start.word().players();
        int depth = start.depth();
        Word startWord = start.word();
        boolean palindrome = startWord.equals(startWord.reversed());
        // Whether the word entering the previous level was a palindrome (for the top doubling).
        boolean palindromeBeforePrevious = false;
        Level previous = null;
        for (Level level : this.levels) {
            if (level.points() != players) {
                throw new IllegalArgumentException(level.name() + " acts on " + level.points()
                        + " points, the word has " + players + " dice");
            }
            boolean keepsDepth = level.doubling() == Level.Doubling.MIRROR;
            if (level.liftsTo() != (keepsDepth ? depth : depth + 1)) {
                throw new IllegalArgumentException(level.name() + " lifts to depth " + level.liftsTo()
                        + " but the word before it has depth " + depth);
            }
            if (level.doubling() == Level.Doubling.PAIRS && depth != 1) {
                throw new IllegalArgumentException("reversal doubling lifts depth 1 only, not " + depth);
            }
            if (level.doubling() == Level.Doubling.TOP && (depth != players - 1 || previous == null
                    || !previous.isFullSymmetricGroup() || !palindromeBeforePrevious)) {
                throw new IllegalArgumentException("the top reversal needs the full group S" + players
                        + " applied to a palindrome of depth " + (players - 2) + " just before it");
            }
            palindromeBeforePrevious = palindrome;
            palindrome = level.isReversal();
            previous = level;
            depth = level.liftsTo();
        }
        if (depth != players) {
            throw new IllegalArgumentException("the levels reach depth " + depth + ", not " + players);
        }
    }

    /** The plain construction: letters AB…, then all n! permutations at each of n−1 levels. */
    public static Construction plain(int players) {
        List<Level> levels = new ArrayList<>();
        for (int k = 2; k <= players; k++) {
            levels.add(Level.relabelling(Families.symmetric(players), k));
        }
        return new Construction(StartingWord.letters(players), levels);
    }

    /**
     * The cheapest construction from the letters AB… using only families uniform on tuples
     * (no word-specific levels), valid for every n by the family proofs alone.
     */
    public static Construction smallestUniform(int players) {
        return fromStart(StartingWord.letters(players));
    }

    /** The cheapest construction from the letters AB…, searched plans included. */
    public static Construction smallest(int players) {
        return smallest(players, List.of());
    }

    /**
     * The cheapest construction from the letters AB… or any of {@code starts}: for each start
     * the smallest valid family per level (reversal doubling for depth 2), and the shipped
     * searched plan for this n if any (see {@link LevelSearch}); the fewest sides win, ties
     * keep the letters.
     */
    public static Construction smallest(int players, List<StartingWord> starts) {
        Construction best = fromStart(StartingWord.letters(players));
        java.util.Optional<Construction> searched = SearchedPlans.forPlayers(players);
        if (searched.isPresent() && searched.get().sidesPerDie().compareTo(best.sidesPerDie()) < 0) {
            best = searched.get();
        }
        for (StartingWord s : starts) {
            if (s.word().players() != players) {
                continue;
            }
            Construction c = fromStart(s);
            if (c.sidesPerDie().compareTo(best.sidesPerDie()) < 0) {
                best = c;
            }
        }
        return best;
    }

    private static Construction fromStart(StartingWord start) {
        Construction plain = fromStart(start, false);
        Construction top = fromStart(start, true);
        return top != null && top.sidesPerDie().compareTo(plain.sidesPerDie()) < 0 ? top : plain;
    }

    /**
     * The smallest family per level; with {@code topReversal}, the last two levels become
     * [mirror] · S_n · reversal instead of S_n · S_n (null when that does not apply).
     */
    private static Construction fromStart(StartingWord start, boolean topReversal) {
        int n = start.word().players();
        int t = start.depth();
        if (topReversal && (n < 4 || t > n - 2)) {
            return null;
        }
        List<Level> levels = new ArrayList<>();
        int last = topReversal ? n - 2 : n;
        boolean palindrome = start.word().equals(start.word().reversed());
        for (int k = t + 1; k <= last; k++) {
            if (k == 2) {
                levels.add(Level.reversal(n));
                palindrome = true;
            } else {
                levels.add(Level.relabelling(Families.smallestUniform(n, k), k));
                palindrome = false;
            }
        }
        if (topReversal) {
            if (!palindrome) {
                levels.add(Level.mirror(n, n - 2));
            }
            levels.add(Level.relabelling(Families.symmetric(n), n - 1));
            levels.add(Level.topReversal(n));
        }
        return new Construction(start, levels);
    }

    public int players() {
        return players;
    }

    public StartingWord start() {
        return start;
    }

    /** Levels, first applied first. */
    public List<Level> levels() {
        return levels;
    }

    /** Returns whether some level is valid only for its particular word (needs exact counts). */
    public boolean hasWordSpecificLevels() {
        for (Level l : levels) {
            if (l.isWordSpecific()) {
                return true;
            }
        }
        return false;
    }

    /** Returns the exact number of sides of every die. */
    public BigInteger sidesPerDie() {
        BigInteger s = BigInteger.valueOf(start.sidesPerDie());
        for (Level l : levels) {
            s = s.multiply(l.blocks());
        }
        return s;
    }

    /** Returns the sides of the plain construction, (n!)^(n−1). */
    public static BigInteger plainSides(int players) {
        return Families.factorial(players).pow(players - 1);
    }

    /** Returns the method: start, then the level families in order, e.g. {@code reversal · PGL(2,5) · A6 · S6 · S6}. */
    public String method() {
        StringJoiner j = new StringJoiner(" · ");
        if (!start.label().equals("letters")) {
            j.add(start.label());
        }
        for (Level l : levels) {
            j.add(l.name());
        }
        return j.toString();
    }

    /** Returns the canonical text hashed by {@link #sha256()}. */
    public String canonicalText() {
        StringBuilder sb = new StringBuilder("precedence-construction-v1:players=").append(players)
                .append(";start=").append(start.word().canonicalText()).append(";levels=");
        for (int i = 0; i < levels.size(); i++) {
            sb.append(i == 0 ? "" : ",").append(levels.get(i).name());
        }
        return sb.toString();
    }

    /** Returns SHA-256 (FIPS 180-4) of the UTF-8 {@link #canonicalText()}, lowercase hex. */
    public String sha256() {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                    .digest(canonicalText().getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform must provide SHA-256", e);
        }
    }

    /** Runs (or recalls) the proof of every level's family; throws if any fails. */
    public List<FamilyProof> proofs() {
        List<FamilyProof> out = new ArrayList<>();
        for (Level l : levels) {
            out.add(l.proof());
        }
        return out;
    }

    @Override
    public String toString() {
        return "Construction[" + players + " dice, " + method() + ", " + sidesPerDie() + " sides]";
    }
}
