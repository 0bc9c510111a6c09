package org.precedence.runtime.dice.io;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.DieNames;
import org.precedence.runtime.dice.InvalidDiceSetException;

/**
 * Collects dice as a reader meets them, remembering where each die, name and value stood, so
 * that the checks every set must pass can point at the offending place. Both formats use it.
 */
final class SetBuilder {
    private static final BigInteger MIN = BigInteger.valueOf(Long.MIN_VALUE);
    private static final BigInteger MAX = BigInteger.valueOf(Long.MAX_VALUE);

    private final List<Die> dice = new ArrayList<>();
    private List<String> names;
    private List<Position> nameAts;
    private Position namesAt;

    private static final class Die {
        final Position at;
        String name;
        Position nameAt;
        final List<Long> faces = new ArrayList<>();
        final List<Position> faceAt = new ArrayList<>();

        Die(Position at) {
            this.at = at;
        }
    }

    /** Starts a die whose description begins at {@code at}. */
    void startDie(Position at) {
        dice.add(new Die(at));
    }

    /** Names the current die. */
    void name(String name, Position at) {
        Die d = current();
        d.name = name;
        d.nameAt = at;
    }

    /**
     * Adds a face to the current die from its decimal text.
     *
     * @throws SetFormatException if the text is not an integer or lies outside the long range
     */
    void face(String literal, Position at) {
        current().faces.add(parseValue(literal, at));
        current().faceAt.add(at);
    }

    /** Sets all names at once (the JSON {@code "names"} member), each with its position. */
    void names(List<String> all, List<Position> each, Position at) {
        this.names = all;
        this.nameAts = each;
        this.namesAt = at;
    }

    int diceSoFar() {
        return dice.size();
    }

    private Die current() {
        return dice.get(dice.size() - 1);
    }

    static long parseValue(String literal, Position at) {
        if (!literal.matches("[+-]?[0-9]+")) {
            throw at.error("'" + shorten(literal) + "' is not a face value (faces are integers)");
        }
        BigInteger v = new BigInteger(literal.startsWith("+") ? literal.substring(1) : literal);
        if (v.compareTo(MIN) < 0 || v.compareTo(MAX) > 0) {
            throw at.error("value " + shorten(literal) + " out of range (faces must lie in "
                    + Long.MIN_VALUE + ".." + Long.MAX_VALUE + ")");
        }
        return v.longValue();
    }

    static String shorten(String s) {
        return s.length() <= 40 ? s : s.substring(0, 37) + "...";
    }

    /**
     * Validates and builds the set.
     *
     * @param end where the input ended (for problems without a better place)
     */
    DiceSet build(Position end) {
        if (dice.size() < 2) {
            Position at = dice.isEmpty() ? end : dice.get(0).at;
            throw at.error("a set needs at least 2 dice, got " + dice.size());
        }
        List<String> resolved = resolveNames(end);
        Map<Long, Integer> owner = new HashMap<>();
        for (int d = 0; d < dice.size(); d++) {
            Die die = dice.get(d);
            if (die.faces.isEmpty()) {
                throw die.at.error("die " + resolved.get(d) + " is empty");
            }
            for (int i = 0; i < die.faces.size(); i++) {
                long v = die.faces.get(i);
                Integer prior = owner.putIfAbsent(v, d);
                if (prior != null) {
                    throw die.faceAt.get(i).error(prior == d
                            ? "duplicate value " + v + " on die " + resolved.get(d)
                            : "duplicate value " + v + " on dice " + resolved.get(prior) + " and "
                                    + resolved.get(d));
                }
            }
        }
        List<long[]> faces = new ArrayList<>();
        for (Die die : dice) {
            faces.add(die.faces.stream().mapToLong(Long::longValue).toArray());
        }
        boolean named = names != null || dice.get(0).name != null;
        if (named) {
            checkNames(resolved);
        }
        try {
            return DiceSet.of(faces, named ? resolved : null);
        } catch (InvalidDiceSetException e) {
            throw end.error(e.getMessage());
        }
    }

    /** Checks each given name where it stands: allowed characters, and no name used twice. */
    private void checkNames(List<String> resolved) {
        Map<String, Integer> seen = new HashMap<>();
        for (int d = 0; d < resolved.size(); d++) {
            Position at = names != null ? nameAts.get(d) : dice.get(d).nameAt;
            try {
                DiceSet.checkName(d, resolved.get(d));
            } catch (InvalidDiceSetException e) {
                throw at.error(e.getMessage());
            }
            Integer prior = seen.putIfAbsent(resolved.get(d), d);
            if (prior != null) {
                throw at.error("dice " + DieNames.of(prior) + " and " + DieNames.of(d)
                        + " share the name '" + resolved.get(d) + "'");
            }
        }
    }

    private List<String> resolveNames(Position end) {
        int n = dice.size();
        List<String> out = new ArrayList<>(n);
        Die firstNamed = null;
        Die firstUnnamed = null;
        for (Die d : dice) {
            if (d.name != null && firstNamed == null) {
                firstNamed = d;
            }
            if (d.name == null && firstUnnamed == null) {
                firstUnnamed = d;
            }
        }
        if (names != null) {
            if (firstNamed != null) {
                throw firstNamed.nameAt.error("die names given twice, in \"names\" and in a die's"
                        + " \"name\"; use one or the other");
            }
            if (names.size() != n) {
                throw namesAt.error(n + " dice but " + names.size() + " names");
            }
            return names;
        }
        if (firstNamed != null && firstUnnamed != null) {
            throw firstUnnamed.at.error("die " + (dice.indexOf(firstUnnamed) + 1)
                    + " has no name but others do; name every die or none");
        }
        for (int d = 0; d < n; d++) {
            out.add(firstNamed == null ? DieNames.of(d) : dice.get(d).name);
        }
        return out;
    }
}
