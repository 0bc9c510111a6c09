package org.precedence.runtime.service;

/**
 * Per-connection limits of the JDK's HTTP server. That server reads them once per process from
 * system properties (documented in the {@code jdk.httpserver} module description), so they are
 * set here before the first server starts, unless the operator set them already on the
 * command line, which then wins.
 */
final class ConnectionLimits {
    private ConnectionLimits() {
    }

    static synchronized void install(ServiceLimits limits) {
        // Whole seconds, as the server reads them; at least one.
        setIfAbsent("sun.net.httpserver.maxReqTime", seconds(limits.requestTimeout()));
        setIfAbsent("sun.net.httpserver.maxRspTime", seconds(limits.responseTimeout()));
        setIfAbsent("sun.net.httpserver.idleInterval", seconds(limits.idleTimeout()));
        setIfAbsent("jdk.httpserver.maxConnections", Integer.toString(limits.maxConnections()));
        // The server writes headers and body separately; with Nagle's algorithm the body then
        // waits for the client's delayed ACK (about 40 ms on Linux) on every keep-alive request.
        setIfAbsent("sun.net.httpserver.nodelay", "true");
    }

    private static String seconds(java.time.Duration d) {
        return Long.toString(Math.max(1, d.toSeconds()));
    }

    private static void setIfAbsent(String key, String value) {
        if (System.getProperty(key) == null) {
            System.setProperty(key, value);
        }
    }
}
