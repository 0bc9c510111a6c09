package org.precedence.game.log;

import java.math.BigInteger;
import java.util.List;
import java.util.Objects;
import org.precedence.api.FairnessGrade;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.game.rules.Ending;
import org.precedence.game.rules.Standing;

/**
 * A whole game: what it takes to re-run it, and what happened, round by round. This is the
 * JSON log's schema; field names are part of the log format {@value #FORMAT}.
 *
 * @param format          always {@value #FORMAT}
 * @param seed            the session seed as given ({@code hex:…} or a phrase)
 * @param seedCommitment  SHA-256 of the seed bytes, as published before play
 * @param mode            the provider's generator
 * @param rule            the order rule of the session
 * @param convention      which face acts first
 * @param provider        the provider's name, for information
 * @param maxRounds       the game's last round
 * @param leaveAfterRound after this round the weakest bot is made to leave (0: never)
 * @param seats           the table, in seat order
 * @param rounds          every round played, in order
 * @param result          how the game ended
 */
public record GameRecord(String format, String seed, String seedCommitment, RandomnessMode mode, OrderRule rule,
        RankingConvention convention, String provider, int maxRounds, int leaveAfterRound, List<SeatEntry> seats,
        List<RoundEntry> rounds, ResultEntry result) {

    /** The log format this version writes and reads. */
    public static final String FORMAT = "shoal-lights-log/1";

    public GameRecord {
        Objects.requireNonNull(format, "format");
        Objects.requireNonNull(seed, "seed");
        Objects.requireNonNull(seedCommitment, "seedCommitment");
        Objects.requireNonNull(mode, "mode");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(convention, "convention");
        Objects.requireNonNull(provider, "provider");
        seats = List.copyOf(Objects.requireNonNull(seats, "seats"));
        rounds = List.copyOf(Objects.requireNonNull(rounds, "rounds"));
        Objects.requireNonNull(result, "result");
    }

    /**
     * One seat.
     *
     * @param seat seat number, 0-based
     * @param name the boat's name
     * @param bot  whether a bot played it
     */
    public record SeatEntry(int seat, String name, boolean bot) {
        public SeatEntry {
            Objects.requireNonNull(name, "name");
        }
    }

    /**
     * One round.
     *
     * @param round      the round number, 1-based (the source was asked for round − 1)
     * @param roster     the seats in the round, in seat order; die i went to roster[i]
     * @param setId      the dice set rolled
     * @param grade      its fairness grade
     * @param rolls      one roll per roster entry, by seat
     * @param order      seats in acting order
     * @param moves      the moves made, in acting order
     * @param departures boats made to leave after the round's moves
     */
    public record RoundEntry(int round, List<Integer> roster, String setId, FairnessGrade grade, List<RollEntry> rolls,
            List<Integer> order, List<MoveEntry> moves, List<Integer> departures) {
        public RoundEntry {
            roster = List.copyOf(Objects.requireNonNull(roster, "roster"));
            Objects.requireNonNull(setId, "setId");
            Objects.requireNonNull(grade, "grade");
            rolls = List.copyOf(Objects.requireNonNull(rolls, "rolls"));
            order = List.copyOf(Objects.requireNonNull(order, "order"));
            moves = List.copyOf(Objects.requireNonNull(moves, "moves"));
            departures = List.copyOf(Objects.requireNonNull(departures, "departures"));
        }
    }

    /**
     * One player's die roll in a round.
     *
     * @param seat      who rolled
     * @param die       the die's letter name
     * @param faceIndex which face came up (0-based)
     * @param faceValue the value on that face
     * @param position  where the seat acted (0 = first)
     */
    public record RollEntry(int seat, String die, BigInteger faceIndex, BigInteger faceValue, int position) {
        public RollEntry {
            Objects.requireNonNull(die, "die");
            Objects.requireNonNull(faceIndex, "faceIndex");
            Objects.requireNonNull(faceValue, "faceValue");
        }
    }

    /**
     * One move.
     *
     * @param seat who moved
     * @param move the move's text, e.g. {@code "sail 2"}
     */
    public record MoveEntry(int seat, String move) {
        public MoveEntry {
            Objects.requireNonNull(move, "move");
        }
    }

    /**
     * The end of the game.
     *
     * @param winner     the winning seat
     * @param winnerName its boat's name
     * @param ending     why the game ended
     * @param rounds     rounds played
     * @param standings  final lines, best first
     */
    public record ResultEntry(int winner, String winnerName, Ending ending, int rounds, List<Standing> standings) {
        public ResultEntry {
            Objects.requireNonNull(winnerName, "winnerName");
            Objects.requireNonNull(ending, "ending");
            standings = List.copyOf(Objects.requireNonNull(standings, "standings"));
        }
    }
}
