package org.precedence.runtime.service;

import com.sun.net.httpserver.Headers;
import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpHandler;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.lang.System.Logger.Level;
import java.net.URLDecoder;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;

/**
 * The single HTTP handler: bounds and decodes the request, routes it, and writes the reply as
 * JSON. Every refusal becomes a 4xx with the {@code error}/{@code detail} body; only a failure
 * of our own becomes a 500, and then the detail says so without internals.
 */
final class HttpFront implements HttpHandler {
    private static final System.Logger LOG = System.getLogger(HttpFront.class.getName());
    private static final int MAX_QUERY_CHARS = 1024;
    /** Oversized bodies up to this size are read to their end before the 413 is sent. */
    static final long DRAIN_LIMIT = 1 << 20;

    private final Router router;
    private final int maxBodyBytes;

    HttpFront(Router router, int maxBodyBytes) {
        this.router = router;
        this.maxBodyBytes = maxBodyBytes;
    }

    @Override
    public void handle(HttpExchange exchange) throws IOException {
        Reply reply;
        String allow = null;
        boolean closeAfter = false;
        try {
            reply = dispatch(exchange);
        } catch (Router.MethodNotAllowed e) {
            reply = Reply.error(e);
            allow = e.allow();
        } catch (BodyTooLarge e) {
            reply = Reply.error(e);
            closeAfter = !e.drained;
        } catch (ApiException e) {
            reply = Reply.error(e);
        } catch (RuntimeException e) {
            LOG.log(Level.ERROR, "internal error on " + exchange.getRequestMethod() + " "
                    + exchange.getRequestURI().getRawPath(), e);
            reply = Reply.error(new ApiException(500, "internal_error",
                    "the service failed on its own side; the request may be retried"));
        }
        try {
            write(exchange, reply, allow, closeAfter);
        } finally {
            exchange.close();
        }
    }

    private Reply dispatch(HttpExchange exchange) {
        String method = exchange.getRequestMethod();
        String path = exchange.getRequestURI().getRawPath();
        Router.Match match = router.match(method, path == null ? "/" : path);
        Map<String, String> query = parseQuery(exchange.getRequestURI().getRawQuery());
        String body = "";
        if (method.equals("POST") || method.equals("PUT")) {
            body = readBody(exchange);
        }
        return match.endpoint().handle(new Request(method, match.params(), query, body));
    }

    private String readBody(HttpExchange exchange) {
        Headers h = exchange.getRequestHeaders();
        String length = h.getFirst("Content-Length");
        if (length != null) {
            long declared;
            try {
                declared = Long.parseLong(length.trim());
            } catch (NumberFormatException e) {
                throw ApiException.badRequest("Content-Length must be a decimal byte count");
            }
            if (declared > maxBodyBytes) {
                throw tooLarge(declared <= DRAIN_LIMIT && drain(exchange.getRequestBody()));
            }
        }
        byte[] bytes;
        InputStream in = exchange.getRequestBody();
        try {
            bytes = readAtMost(in, maxBodyBytes + 1);
        } catch (IOException e) {
            throw new ApiException(400, "unreadable_body", "the request body could not be read: " + e.getMessage());
        }
        if (bytes.length > maxBodyBytes) {
            throw tooLarge(drain(in));
        }
        if (bytes.length > 0) {
            String type = h.getFirst("Content-Type");
            if (type != null && !type.toLowerCase(Locale.ROOT).strip().startsWith("application/json")) {
                throw new ApiException(415, "unsupported_media_type", "request bodies are application/json, got "
                        + JsonFields.abbreviate(type));
            }
        }
        try {
            return StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw ApiException.badJson("the request body is not valid UTF-8 (RFC 8259 §8.1 requires UTF-8)");
        }
    }

    private BodyTooLarge tooLarge(boolean drained) {
        return new BodyTooLarge("request bodies are limited to " + maxBodyBytes + " bytes", drained);
    }

    /*
     * Answering before the client has finished sending, then closing, makes the kernel reset
     * the connection (unread data in the receive buffer), and a reset can destroy the answer
     * in flight (RFC 9112 §9.6 describes this hazard). So the rest of a moderately oversized
     * body is read and thrown away first; only beyond DRAIN_LIMIT is the connection closed
     * at once. The request time limit bounds the draining.
     */
    private static boolean drain(InputStream in) {
        byte[] buf = new byte[8192];
        long total = 0;
        try {
            int n;
            while ((n = in.read(buf)) > 0) {
                total += n;
                if (total > DRAIN_LIMIT) {
                    return false;
                }
            }
            return true;
        } catch (IOException e) {
            return false;
        }
    }

    /** A 413 that knows whether the rest of the body was consumed (else the connection closes). */
    static final class BodyTooLarge extends ApiException {
        private static final long serialVersionUID = 1L;
        final boolean drained;

        BodyTooLarge(String detail, boolean drained) {
            super(413, "body_too_large", detail);
            this.drained = drained;
        }
    }

    private static byte[] readAtMost(InputStream in, int limit) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream(Math.min(limit, 8192));
        byte[] buf = new byte[8192];
        int total = 0;
        int n;
        while (total < limit && (n = in.read(buf, 0, Math.min(buf.length, limit - total))) > 0) {
            out.write(buf, 0, n);
            total += n;
        }
        return out.toByteArray();
    }

    private static Map<String, String> parseQuery(String raw) {
        Map<String, String> params = new HashMap<>();
        if (raw == null || raw.isEmpty()) {
            return params;
        }
        if (raw.length() > MAX_QUERY_CHARS) {
            throw ApiException.badRequest("the query string is limited to " + MAX_QUERY_CHARS + " characters");
        }
        for (String pair : raw.split("&")) {
            if (pair.isEmpty()) {
                continue;
            }
            int eq = pair.indexOf('=');
            String name;
            String value;
            try {
                name = URLDecoder.decode(eq < 0 ? pair : pair.substring(0, eq), StandardCharsets.UTF_8);
                value = eq < 0 ? "" : URLDecoder.decode(pair.substring(eq + 1), StandardCharsets.UTF_8);
            } catch (IllegalArgumentException e) {
                throw ApiException.badRequest("the query string has a malformed %-escape");
            }
            if (params.putIfAbsent(name, value) != null) {
                throw ApiException.badRequest("query parameter \"" + JsonFields.abbreviate(name) + "\" is given twice");
            }
        }
        return params;
    }

    private static void write(HttpExchange exchange, Reply reply, String allow, boolean closeAfter) throws IOException {
        byte[] bytes = reply.json().getBytes(StandardCharsets.UTF_8);
        Headers h = exchange.getResponseHeaders();
        h.set("Content-Type", "application/json; charset=utf-8");
        // Tokens and seeds must not linger in shared caches.
        h.set("Cache-Control", "no-store");
        h.set("X-Content-Type-Options", "nosniff");
        reply.headers().forEach(h::set);
        if (allow != null) {
            h.set("Allow", allow);
        }
        if (closeAfter) {
            h.set("Connection", "close");
        }
        if (exchange.getRequestMethod().equals("HEAD")) {
            exchange.sendResponseHeaders(reply.status(), -1);
            return;
        }
        exchange.sendResponseHeaders(reply.status(), bytes.length);
        try (OutputStream out = exchange.getResponseBody()) {
            out.write(bytes);
        }
    }
}
