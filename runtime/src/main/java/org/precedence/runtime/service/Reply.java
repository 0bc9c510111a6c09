package org.precedence.runtime.service;

import com.google.gson.JsonObject;
import java.util.Map;

/** A JSON response: status, body, and extra headers. */
record Reply(int status, JsonObject body, Map<String, String> headers) {

    static Reply ok(JsonObject body) {
        return new Reply(200, body, Map.of());
    }

    static Reply created(JsonObject body, String location) {
        return new Reply(201, body, Map.of("Location", location));
    }

    /** The one error shape: {@code {"error": code, "detail": one line}}. */
    static Reply error(ApiException e) {
        JsonObject body = new JsonObject();
        body.addProperty("error", e.error());
        body.addProperty("detail", e.detail());
        return new Reply(e.status(), body, Map.of());
    }
}
