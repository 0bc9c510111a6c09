package org.precedence.cli.export;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.ServiceLoader;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderProvider;
import org.precedence.api.TurnOrderSource;
import org.precedence.cli.UserInputException;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.provider.DiceSession;
import org.precedence.runtime.source.SetSource;

/** Finds the served set for n players and turns it into a {@link PrintableSet}, or says why not. */
final class ServedSets {
    /** More faces than this are refused: no one makes such dice by hand. */
    static final long MAX_PRINTABLE_FACES = 100_000;

    private ServedSets() {
    }

    /**
     * Returns the sets the provider on the class path serves: a {@link SetSource} registered
     * with {@link ServiceLoader} if there is one, else the sets behind the provider's sessions
     * ({@link DiceSession#sets()}), so that export prints exactly what engines roll.
     *
     * @throws IllegalStateException if neither can be found
     */
    static SetSource discover() {
        return ServiceLoader.load(SetSource.class).findFirst().orElseGet(() -> {
            TurnOrderSource session = TurnOrderProvider.load()
                    .open(SessionSpec.of(SessionSeed.fromText("precedence-export")));
            if (session instanceof DiceSession dice) {
                return dice.sets();
            }
            throw new IllegalStateException("the provider on the class path does not say which sets it serves");
        });
    }

    /**
     * Returns the printable form of the set {@code source} serves for {@code players}.
     *
     * @throws UserInputException if the set cannot be listed face by face
     */
    static PrintableSet printable(SetSource source, int players) {
        if (players < 2 || players > source.maxPlayers()) {
            throw new UserInputException("--players: " + players + " is out of range; allowed 2.."
                    + source.maxPlayers());
        }
        MixedRadixDice dice = source.forPlayers(players);
        if (!(dice instanceof ExplicitDice explicit)) {
            throw new UserInputException("the set served for " + players + " players (" + dice.id()
                    + ") is constructed: " + sidesText(dice) + " per die, too many faces to list;"
                    + " only catalog sets can be exported");
        }
        List<long[]> faces = new ArrayList<>();
        long total = 0;
        for (int d = 0; d < explicit.players(); d++) {
            long[] f = new long[explicit.sideCount(d)];
            for (int i = 0; i < f.length; i++) {
                f[i] = explicit.value(d, i);
            }
            Arrays.sort(f);
            faces.add(f);
            total += f.length;
        }
        if (total > MAX_PRINTABLE_FACES) {
            throw new UserInputException("the set served for " + players + " players has " + total
                    + " faces in all; export lists at most " + MAX_PRINTABLE_FACES);
        }
        return new PrintableSet(dice.id(), dice.sha256(), dice.grade(), dice.subsetDepth(), faces);
    }

    private static String sidesText(MixedRadixDice dice) {
        BigInteger s = dice.sides(0);
        boolean equal = true;
        for (int d = 1; d < dice.players(); d++) {
            equal &= dice.sides(d).equals(s);
            s = s.max(dice.sides(d));
        }
        String digits = s.toString();
        String shown = digits.length() <= 12 ? digits : digits.charAt(0) + "." + digits.substring(1, 3)
                + "e" + (digits.length() - 1);
        return (equal ? "" : "up to ") + shown + " sides";
    }
}
