package org.precedence.runtime.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;

/** A java.net.http client for one running service, with JSON helpers for the tests. */
final class ServiceClient {
    private final HttpClient http = HttpClient.newBuilder().version(HttpClient.Version.HTTP_1_1)
            .connectTimeout(Duration.ofSeconds(5)).build();
    private final URI base;

    ServiceClient(RandomizerService service) {
        URI b = service.baseUri();
        this.base = URI.create(b.getScheme() + "://" + b.getAuthority());
    }

    URI uri(String path) {
        return base.resolve(path);
    }

    HttpResponse<String> get(String path) {
        return send(HttpRequest.newBuilder(uri(path)).GET());
    }

    HttpResponse<String> post(String path, String json) {
        return send(HttpRequest.newBuilder(uri(path)).header("Content-Type", "application/json")
                .POST(HttpRequest.BodyPublishers.ofString(json)));
    }

    HttpResponse<String> send(HttpRequest.Builder request) {
        try {
            return http.send(request.timeout(Duration.ofSeconds(20)).build(), HttpResponse.BodyHandlers.ofString());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        }
    }

    static JsonObject json(HttpResponse<String> r) {
        assertTrue(r.headers().firstValue("Content-Type").orElse("").startsWith("application/json"),
                "JSON content type on " + r.uri());
        return JsonParser.parseString(r.body()).getAsJsonObject();
    }

    static JsonObject ok(HttpResponse<String> r, int status) {
        assertEquals(status, r.statusCode(), r.body());
        return json(r);
    }

    /** Asserts the one error shape: exactly {@code error} and a non-blank {@code detail}. */
    static JsonObject error(HttpResponse<String> r, int status, String code) {
        assertEquals(status, r.statusCode(), r.body());
        JsonObject o = json(r);
        assertEquals(code, o.get("error").getAsString(), r.body());
        assertTrue(!o.get("detail").getAsString().isBlank(), r.body());
        assertEquals(2, o.size(), "error body has exactly error and detail: " + r.body());
        return o;
    }
}
