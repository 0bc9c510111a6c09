package org.precedence.cli;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import org.precedence.game.replay.ReplayReport;

/** The {@code play --replay --format json} document. */
final class ReplayJson {
    private ReplayJson() {
    }

    static String of(String log, ReplayReport report) {
        JsonObject json = new JsonObject();
        json.addProperty("log", log);
        json.addProperty("matches", report.matches());
        json.addProperty("roundsChecked", report.roundsChecked());
        json.addProperty("verdict", report.verdict());
        JsonArray lines = new JsonArray();
        report.lines().forEach(lines::add);
        json.add("lines", lines);
        return new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create().toJson(json);
    }
}
