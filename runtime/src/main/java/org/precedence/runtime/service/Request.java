package org.precedence.runtime.service;

import com.google.gson.JsonObject;
import java.util.Map;
import java.util.Set;

/**
 * One routed request: its path parameters, query parameters, and body text (already bounded
 * by {@link ServiceLimits#maxBodyBytes()}).
 */
record Request(String method, Map<String, String> pathParams, Map<String, String> query, String body) {

    String path(String name) {
        return pathParams.get(name);
    }

    /** Returns the body as a strict JSON object; an empty body is a 400. */
    JsonObject bodyObject() {
        return StrictJson.parseObject(body);
    }

    /** Returns the body as a JSON object, or an empty one when there is no body. */
    JsonObject optionalBodyObject() {
        return body.isBlank() ? new JsonObject() : StrictJson.parseObject(body);
    }

    /** Refuses query parameters outside {@code allowed}. */
    Request allowQuery(Set<String> allowed) {
        for (String name : query.keySet()) {
            if (!allowed.contains(name)) {
                throw new ApiException(400, "unknown_parameter", "unknown query parameter \"" + name + "\""
                        + (allowed.isEmpty() ? "; this endpoint takes none"
                                : "; allowed: " + String.join(", ", new java.util.TreeSet<>(allowed))));
            }
        }
        return this;
    }
}
