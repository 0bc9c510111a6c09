package org.precedence.runtime.replay;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.precedence.api.RoundResult;
import org.precedence.runtime.provider.DiceSession;

/**
 * Plays rounds of a session and records them for the log. Thread-safe.
 */
public final class SessionRecorder {
    private final DiceSession session;
    private final List<LoggedRound> rounds = new ArrayList<>();

    public SessionRecorder(DiceSession session) {
        this.session = Objects.requireNonNull(session, "session");
    }

    /**
     * Rolls round {@code round} for {@code roster} and records it.
     *
     * @throws NullPointerException     if the roster or a name is null
     * @throws IllegalArgumentException if the roster is empty or has duplicates, the round is
     *                                  negative, or the count is not served
     */
    public synchronized RoundResult play(long round, List<String> roster) {
        Objects.requireNonNull(roster, "roster");
        if (roster.isEmpty()) {
            throw new IllegalArgumentException("roster must not be empty");
        }
        HashSet<String> seen = new HashSet<>();
        for (int i = 0; i < roster.size(); i++) {
            String name = Objects.requireNonNull(roster.get(i), "roster name at index " + i);
            if (!seen.add(name)) {
                throw new IllegalArgumentException("duplicate roster name at index " + i + ": " + name);
            }
        }
        RoundResult result = session.roll(round, roster.size());
        var set = session.setFor(roster.size());
        List<String> faces = result.faceValues().stream().map(Object::toString).toList();
        rounds.add(new LoggedRound(round, roster, set.id(), set.sha256(), faces, result.order()));
        return result;
    }

    /** Returns the log so far, with the seed revealed or only the commitment. */
    public synchronized SessionLog log(boolean revealSeed) {
        var spec = session.spec();
        return new SessionLog(SessionLog.FORMAT_VERSION, session.algorithmId(), spec.mode(), spec.rule(),
                spec.convention(), spec.seed().commitment(),
                revealSeed ? Optional.of(spec.seed()) : Optional.empty(), rounds);
    }
}
