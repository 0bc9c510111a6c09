package org.precedence.runtime.replay;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.provider.DiceSession;
import org.precedence.runtime.randomness.RollGenerator;
import org.precedence.runtime.source.SetSource;

/**
 * Verifies a log: the revealed seed against the commitment, then every round recomputed from
 * scratch and compared field by field, stopping at the first mismatch.
 */
public final class Replayer {
    private final SetSource sets;

    public Replayer(SetSource sets) {
        this.sets = Objects.requireNonNull(sets, "sets");
    }

    /**
     * Replays {@code log}. The seed is the one in the log, or {@code revealed} when the log has
     * only the commitment (if both are given they must agree).
     *
     * @throws MalformedLogException if the algorithm is unknown, no seed is available, or a
     *                               round cannot be recomputed (unserved count, bad sizes)
     */
    public ReplayReport verify(SessionLog log, Optional<SessionSeed> revealed) {
        Objects.requireNonNull(log, "log");
        Objects.requireNonNull(revealed, "revealed");
        RandomnessMode mode = RollGenerator.modeOf(log.algorithm());
        if (mode == null) {
            throw new MalformedLogException("unknown algorithm '" + log.algorithm() + "'; this version replays "
                    + String.join(", ", RollGenerator.ALGORITHM_IDS));
        }
        if (mode != log.mode()) {
            return mismatch(0, new Mismatch(-1, "mode", -1, -1, mode.toString(), log.mode().toString()));
        }
        if (log.seed().isPresent() && revealed.isPresent() && !log.seed().get().equals(revealed.get())) {
            return mismatch(0, new Mismatch(-1, "seed", -1, -1, "the given seed", "another seed in the log"));
        }
        SessionSeed seed = log.seed().or(() -> revealed).orElseThrow(() -> new MalformedLogException(
                "the log has only the commitment; give the revealed seed to replay it"));
        if (!seed.matchesCommitment(log.commitment())) {
            return mismatch(0, new Mismatch(-1, "commitment", -1, -1, seed.commitment(), log.commitment()));
        }
        DiceSession session = DiceSession.open(new SessionSpec(seed, mode, log.rule(), log.convention()), sets,
                log.algorithm());
        int checked = 0;
        for (LoggedRound logged : log.rounds()) {
            Optional<Mismatch> m = check(session, logged);
            if (m.isPresent()) {
                return mismatch(checked, m.get());
            }
            checked++;
        }
        return new ReplayReport(checked, Optional.empty());
    }

    private static ReplayReport mismatch(int checked, Mismatch m) {
        return new ReplayReport(checked, Optional.of(m));
    }

    private Optional<Mismatch> check(DiceSession session, LoggedRound logged) {
        long round = logged.round();
        int n = logged.roster().size();
        if (logged.faces().size() != n || logged.order().size() != n) {
            throw new MalformedLogException("round " + round + ": roster has " + n + " players but faces has "
                    + logged.faces().size() + " and order " + logged.order().size());
        }
        if (n < 2) {
            throw new MalformedLogException("round " + round + ": a logged roll has at least 2 players, got " + n);
        }
        MixedRadixDice set;
        RoundResult expected;
        try {
            set = session.setFor(n);
            expected = session.roll(round, n);
        } catch (IllegalArgumentException e) {
            throw new MalformedLogException("round " + round + ": cannot recompute: " + e.getMessage(), e);
        }
        if (!set.id().equals(logged.setId())) {
            return Optional.of(new Mismatch(round, "setId", -1, -1, set.id(), logged.setId()));
        }
        if (!set.sha256().equals(logged.setSha256())) {
            return Optional.of(new Mismatch(round, "setSha256", -1, -1, set.sha256(), logged.setSha256()));
        }
        List<String> faces = expected.faceValues().stream().map(Object::toString).toList();
        for (int i = 0; i < n; i++) {
            if (!faces.get(i).equals(logged.faces().get(i))) {
                return Optional.of(new Mismatch(round, "faces", i, -1, faces.get(i), logged.faces().get(i)));
            }
        }
        for (int p = 0; p < n; p++) {
            int want = expected.order().get(p);
            int got = logged.order().get(p);
            if (want != got) {
                return Optional.of(new Mismatch(round, "order", want, p, "player " + want, "player " + got));
            }
        }
        return Optional.empty();
    }
}
