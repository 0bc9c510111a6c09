package org.precedence.runtime.service;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * Maps (method, path) to an endpoint. Path templates are literal segments and {@code {name}}
 * parameters, one segment each. A path no template matches is a 404; a path that matches with
 * another method is a 405 listing the allowed methods.
 */
final class Router {
    private record Route(String method, String[] segments, Endpoint endpoint) {
    }

    /** A match: the endpoint and the parameter values taken from the path. */
    record Match(Endpoint endpoint, Map<String, String> params) {
    }

    private final List<Route> routes = new ArrayList<>();

    Router add(String method, String template, Endpoint endpoint) {
        routes.add(new Route(method, split(template), endpoint));
        return this;
    }

    /** Finds the endpoint, or throws a 404 or 405 {@link ApiException}. */
    Match match(String method, String path) {
        String[] segments = split(path);
        TreeSet<String> allowed = new TreeSet<>();
        for (Route r : routes) {
            Map<String, String> params = bind(r.segments, segments);
            if (params == null) {
                continue;
            }
            if (r.method.equals(method)) {
                return new Match(r.endpoint, params);
            }
            allowed.add(r.method);
        }
        if (allowed.isEmpty()) {
            throw new ApiException(404, "not_found", "no endpoint at " + JsonFields.abbreviate(path)
                    + "; the service's endpoints are listed in docs/service.md");
        }
        throw new MethodNotAllowed(method, path, String.join(", ", allowed));
    }

    /** A 405 that carries the {@code Allow} header value. */
    static final class MethodNotAllowed extends ApiException {
        private static final long serialVersionUID = 1L;
        private final String allow;

        MethodNotAllowed(String method, String path, String allow) {
            super(405, "method_not_allowed", JsonFields.abbreviate(method) + " is not allowed on "
                    + JsonFields.abbreviate(path) + "; allowed: " + allow);
            this.allow = allow;
        }

        String allow() {
            return allow;
        }
    }

    private static Map<String, String> bind(String[] template, String[] path) {
        if (template.length != path.length) {
            return null;
        }
        Map<String, String> params = new HashMap<>();
        for (int i = 0; i < template.length; i++) {
            String t = template[i];
            if (t.startsWith("{") && t.endsWith("}")) {
                if (path[i].isEmpty()) {
                    return null;
                }
                params.put(t.substring(1, t.length() - 1), path[i]);
            } else if (!t.equals(path[i])) {
                return null;
            }
        }
        return params;
    }

    private static String[] split(String path) {
        // "/v1/sets/4" -> ["v1", "sets", "4"]; a trailing slash leaves an empty last segment,
        // which matches no template, so "/v1/sets/" is a 404 rather than an alias.
        String p = path.startsWith("/") ? path.substring(1) : path;
        return p.split("/", -1);
    }
}
