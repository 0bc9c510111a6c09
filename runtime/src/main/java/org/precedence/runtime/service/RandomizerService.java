package org.precedence.runtime.service;

import com.google.gson.JsonObject;
import com.sun.net.httpserver.HttpServer;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.URI;
import java.time.Clock;
import java.util.Objects;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.precedence.api.TurnOrderProvider;
import org.precedence.runtime.source.SetSource;

/**
 * The randomizer service: seeded, verifiable turn orders over HTTP/JSON, on the JDK's HTTP
 * server with a bounded pool of workers. Stateless: every session lives in its sealed token,
 * so any number of replicas that share the key ring serve the same sessions.
 *
 * <pre>{@code
 * try (RandomizerService service = RandomizerService.builder()
 *         .keys(KeyFiles.loadOrCreate(path)).provider(provider).sets(sets).start()) {
 *     URI base = service.baseUri();   // http://127.0.0.1:PORT/v1/
 * }
 * }</pre>
 */
public final class RandomizerService implements AutoCloseable {
    /** The path prefix of every endpoint. */
    public static final String PREFIX = "/v1";

    private final HttpServer server;
    private final ThreadPoolExecutor workers;

    private RandomizerService(HttpServer server, ThreadPoolExecutor workers) {
        this.server = server;
        this.workers = workers;
    }

    /** Returns a builder; keys, provider and sets are required. */
    public static Builder builder() {
        return new Builder();
    }

    /** Returns the bound address (with the actual port when port 0 was asked for). */
    public InetSocketAddress address() {
        return server.getAddress();
    }

    /** Returns {@code http://host:port/v1/}. */
    public URI baseUri() {
        InetSocketAddress a = address();
        String host = a.getAddress().getHostAddress();
        if (host.contains(":")) {
            host = "[" + host + "]";
        }
        return URI.create("http://" + host + ":" + a.getPort() + PREFIX + "/");
    }

    /** Stops accepting, lets running requests finish for up to one second, then stops workers. */
    @Override
    public void close() {
        server.stop(1);
        workers.shutdown();
        try {
            if (!workers.awaitTermination(5, TimeUnit.SECONDS)) {
                workers.shutdownNow();
            }
        } catch (InterruptedException e) {
            workers.shutdownNow();
            Thread.currentThread().interrupt();
        }
    }

    /** Configures and starts a service. */
    public static final class Builder {
        private InetSocketAddress address = new InetSocketAddress(InetAddress.getLoopbackAddress(), 0);
        private ServiceLimits limits = ServiceLimits.defaults();
        private KeyRing keys;
        private TurnOrderProvider provider;
        private SetSource sets;
        private Clock clock = Clock.systemUTC();

        private Builder() {
        }

        /** Where to listen; default loopback, an ephemeral port. */
        public Builder address(InetSocketAddress value) {
            this.address = Objects.requireNonNull(value, "address");
            return this;
        }

        public Builder limits(ServiceLimits value) {
            this.limits = Objects.requireNonNull(value, "limits");
            return this;
        }

        public Builder keys(KeyRing value) {
            this.keys = Objects.requireNonNull(value, "keys");
            return this;
        }

        public Builder provider(TurnOrderProvider value) {
            this.provider = Objects.requireNonNull(value, "provider");
            return this;
        }

        public Builder sets(SetSource value) {
            this.sets = Objects.requireNonNull(value, "sets");
            return this;
        }

        /** The clock for creation times and expiry (tests inject a fixed one). */
        public Builder clock(Clock value) {
            this.clock = Objects.requireNonNull(value, "clock");
            return this;
        }

        /**
         * Binds and starts the server.
         *
         * @throws UncheckedIOException if the address cannot be bound
         */
        public RandomizerService start() {
            Objects.requireNonNull(keys, "keys");
            Objects.requireNonNull(provider, "provider");
            Objects.requireNonNull(sets, "sets");
            ConnectionLimits.install(limits);
            Sessions sessions = new Sessions(new TokenSealer(keys), provider, clock, limits.maxSessionAge());
            Backend backend = new Backend(provider, sets, limits, sessions, clock);
            Router router = routes(backend);
            ThreadPoolExecutor workers = new ThreadPoolExecutor(limits.threads(), limits.threads(),
                    30, TimeUnit.SECONDS, new ArrayBlockingQueue<>(limits.queueCapacity()), new Named());
            HttpServer server;
            try {
                // Backlog of pending accepts, bounded like the work queue.
                server = HttpServer.create(address, limits.queueCapacity());
            } catch (IOException e) {
                workers.shutdown();
                throw new UncheckedIOException("cannot listen on " + address + ": " + e.getMessage(), e);
            }
            server.createContext("/", new HttpFront(router, limits.maxBodyBytes()));
            server.setExecutor(workers);
            server.start();
            return new RandomizerService(server, workers);
        }

        private static Router routes(Backend backend) {
            SessionEndpoints sessions = new SessionEndpoints(backend);
            return new Router()
                    .add("GET", PREFIX + "/health", request -> health(backend, request))
                    .add("GET", PREFIX + "/sets/{players}", new SetEndpoint(backend))
                    .add("POST", PREFIX + "/sessions", sessions::create)
                    .add("GET", PREFIX + "/sessions/{token}", sessions::describe)
                    .add("GET", PREFIX + "/sessions/{token}/rounds/{round}", sessions::round)
                    .add("POST", PREFIX + "/sessions/{token}/reveal", sessions::reveal)
                    .add("POST", PREFIX + "/verify", new VerifyEndpoint(backend))
                    .add("POST", PREFIX + "/simulate", new SimulateEndpoint(backend));
        }

        private static Reply health(Backend backend, Request request) {
            request.allowQuery(java.util.Set.of());
            JsonObject body = new JsonObject();
            body.addProperty("status", "ok");
            body.addProperty("provider", backend.provider.name());
            JsonObject l = new JsonObject();
            l.addProperty("maxPlayers", backend.maxPlayers());
            l.addProperty("maxBodyBytes", backend.limits.maxBodyBytes());
            l.addProperty("maxSimulationRounds", backend.limits.maxSimulationRounds());
            l.addProperty("maxSimulationRolls", backend.limits.maxSimulationRolls());
            l.addProperty("maxLogRounds", backend.limits.maxLogRounds());
            l.addProperty("maxSessionAgeSeconds", backend.limits.maxSessionAge().toSeconds());
            body.add("limits", l);
            return Reply.ok(body);
        }
    }

    private static final class Named implements ThreadFactory {
        private final AtomicInteger count = new AtomicInteger();

        @Override
        public Thread newThread(Runnable r) {
            Thread t = new Thread(r, "precedence-service-" + count.incrementAndGet());
            t.setDaemon(true);
            return t;
        }
    }
}
