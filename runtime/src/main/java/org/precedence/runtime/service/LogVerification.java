package org.precedence.runtime.service;

import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import java.util.Optional;
import org.precedence.api.SessionSeed;
import org.precedence.runtime.replay.MalformedLogException;
import org.precedence.runtime.replay.Mismatch;
import org.precedence.runtime.replay.ReplayReport;
import org.precedence.runtime.replay.Replayer;
import org.precedence.runtime.replay.SessionLog;
import org.precedence.runtime.replay.SessionLogFiles;

/**
 * {@code POST /v1/verify} with {@code {"log": <session log>, "seed": optional}}: a log written by
 * the library's recorder (format {@value SessionLog#FORMAT_NAME}), replayed by the library's
 * {@link Replayer} against the service's sets, so the service and {@code precedence replay}
 * give the same verdict. {@code seed} supplies the revealed seed when the log holds only the
 * commitment.
 */
final class LogVerification {

    private LogVerification() {
    }

    static Reply verify(JsonFields body, Backend backend) {
        for (String other : new String[] {"token", "commitment", "mode", "rule", "convention", "rounds"}) {
            if (body.has(other)) {
                throw ApiException.badRequest("a \"log\" carries its own parameters and rounds; \"" + other
                        + "\" may not be given with it (allowed beside it: seed)");
            }
        }
        JsonObject logObject = JsonFields.asObject(body.get("log"), "log");
        JsonElement rounds = logObject.get("rounds");
        if (rounds != null && rounds.isJsonArray() && rounds.getAsJsonArray().size() > backend.limits.maxLogRounds()) {
            throw ApiException.badRequest("\"log.rounds\" may hold at most " + backend.limits.maxLogRounds()
                    + " entries, got " + rounds.getAsJsonArray().size() + "; submit the log in parts");
        }
        Optional<SessionSeed> seed = Optional.empty();
        if (body.has("seed")) {
            String hex = body.requiredString("seed", 64);
            try {
                seed = Optional.of(SessionSeed.fromHex(hex));
            } catch (IllegalArgumentException e) {
                throw ApiException.badRequest("\"seed\" must be the revealed seed, 64 hexadecimal digits");
            }
        }
        SessionLog log;
        ReplayReport report;
        try {
            log = SessionLogFiles.fromJson(Reply.GSON.toJson(logObject));
            report = new Replayer(backend.sets).verify(log, seed);
        } catch (MalformedLogException e) {
            throw new ApiException(400, "malformed_log", e.getMessage());
        } catch (IllegalArgumentException e) {
            throw new ApiException(400, "malformed_log", "the log cannot be replayed: " + e.getMessage());
        }
        JsonObject out = new JsonObject();
        out.addProperty("valid", report.ok());
        out.addProperty("format", SessionLog.FORMAT_NAME);
        out.addProperty("roundsChecked", report.roundsChecked());
        out.addProperty("roundsInLog", log.rounds().size());
        if (report.mismatch().isPresent()) {
            Mismatch m = report.mismatch().get();
            JsonObject j = new JsonObject();
            j.addProperty("round", m.round());
            j.addProperty("field", m.field());
            j.addProperty("player", m.player());
            j.addProperty("position", m.position());
            j.addProperty("expected", m.expected());
            j.addProperty("found", m.found());
            j.addProperty("description", m.describe());
            out.add("mismatch", j);
        } else {
            out.add("mismatch", JsonNull.INSTANCE);
        }
        return Reply.ok(out);
    }
}
