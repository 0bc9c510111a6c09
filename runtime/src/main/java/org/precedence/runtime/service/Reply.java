package org.precedence.runtime.service;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonObject;
import java.util.Map;

/** A JSON response: status, the serialized body, and extra headers. */
record Reply(int status, String json, Map<String, String> headers) {
    static final Gson GSON = new GsonBuilder().disableHtmlEscaping().serializeNulls().create();

    static Reply ok(JsonObject body) {
        return new Reply(200, GSON.toJson(body), Map.of());
    }

    /** A 200 whose body was already written as JSON (the hot round path streams it). */
    static Reply okJson(String json) {
        return new Reply(200, json, Map.of());
    }

    static Reply created(JsonObject body, String location) {
        return new Reply(201, GSON.toJson(body), Map.of("Location", location));
    }

    /** The one error shape: {@code {"error": code, "detail": one line}}. */
    static Reply error(ApiException e) {
        JsonObject body = new JsonObject();
        body.addProperty("error", e.error());
        body.addProperty("detail", e.detail());
        return new Reply(e.status(), GSON.toJson(body), Map.of());
    }
}
