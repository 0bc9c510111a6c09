package org.precedence.runtime.service;

import java.time.Duration;
import java.util.Objects;

/**
 * Every bound the service enforces. A request beyond a bound gets a 4xx naming the bound.
 *
 * @param maxBodyBytes        largest request body accepted (413 beyond)
 * @param maxPlayers          largest player count for sets, sessions and rounds
 * @param maxSimulationRounds largest {@code rounds} of one simulation request
 * @param maxSimulationRolls  largest rounds × players of one simulation request
 * @param maxLogRounds        largest number of rounds in one submitted log
 * @param threads             worker threads handling requests
 * @param queueCapacity       requests waiting for a worker before new ones are refused
 * @param requestTimeout      longest time from a request's first byte to its last (slow
 *                            senders are disconnected)
 * @param responseTimeout     longest time to send a response
 * @param idleTimeout         how long an idle keep-alive connection stays open
 * @param maxConnections      most simultaneous connections
 * @param maxSessionAge       how long a session token stays valid after its creation (410 after)
 * @param maxConcurrentSimulations simulations running at once (503 beyond)
 */
public record ServiceLimits(int maxBodyBytes, int maxPlayers, int maxSimulationRounds, long maxSimulationRolls,
        int maxLogRounds, int threads, int queueCapacity, Duration requestTimeout, Duration responseTimeout,
        Duration idleTimeout, int maxConnections, Duration maxSessionAge, int maxConcurrentSimulations) {

    public ServiceLimits {
        positive(maxBodyBytes, "maxBodyBytes");
        positive(maxSimulationRounds, "maxSimulationRounds");
        positive(maxSimulationRolls, "maxSimulationRolls");
        positive(maxLogRounds, "maxLogRounds");
        positive(threads, "threads");
        positive(queueCapacity, "queueCapacity");
        positive(maxConnections, "maxConnections");
        positive(maxConcurrentSimulations, "maxConcurrentSimulations");
        if (maxPlayers < 2 || maxPlayers > 0xFFFF) {
            throw new IllegalArgumentException("maxPlayers must be 2..65535, got " + maxPlayers);
        }
        positive(requestTimeout, "requestTimeout");
        positive(responseTimeout, "responseTimeout");
        positive(idleTimeout, "idleTimeout");
        positive(maxSessionAge, "maxSessionAge");
    }

    /**
     * The defaults: 64 KiB bodies, 64 players, 100,000 simulated rounds, 10-second timeouts,
     * one simulation at a time per four workers.
     */
    public static ServiceLimits defaults() {
        int workers = Math.max(4, 2 * Runtime.getRuntime().availableProcessors());
        return new ServiceLimits(64 * 1024, 64, 100_000, 2_000_000L, 10_000, workers, 1024,
                Duration.ofSeconds(10), Duration.ofSeconds(10), Duration.ofSeconds(30), 2048,
                Duration.ofDays(30), Math.max(1, workers / 4));
    }

    /** Returns a copy with another body limit. */
    public ServiceLimits withMaxBodyBytes(int value) {
        return new ServiceLimits(value, maxPlayers, maxSimulationRounds, maxSimulationRolls, maxLogRounds, threads,
                queueCapacity, requestTimeout, responseTimeout, idleTimeout,
                maxConnections, maxSessionAge, maxConcurrentSimulations);
    }

    /** Returns a copy with another player limit. */
    public ServiceLimits withMaxPlayers(int value) {
        return new ServiceLimits(maxBodyBytes, value, maxSimulationRounds, maxSimulationRolls, maxLogRounds, threads,
                queueCapacity, requestTimeout, responseTimeout, idleTimeout,
                maxConnections, maxSessionAge, maxConcurrentSimulations);
    }

    /** Returns a copy with other simulation limits. */
    public ServiceLimits withSimulation(int rounds, long rolls) {
        return new ServiceLimits(maxBodyBytes, maxPlayers, rounds, rolls, maxLogRounds, threads,
                queueCapacity, requestTimeout, responseTimeout, idleTimeout,
                maxConnections, maxSessionAge, maxConcurrentSimulations);
    }

    /** Returns a copy with another limit on rounds in a submitted log. */
    public ServiceLimits withMaxLogRounds(int value) {
        return new ServiceLimits(maxBodyBytes, maxPlayers, maxSimulationRounds, maxSimulationRolls, value,
                threads, queueCapacity, requestTimeout, responseTimeout, idleTimeout,
                maxConnections, maxSessionAge, maxConcurrentSimulations);
    }

    /** Returns a copy with another worker count. */
    public ServiceLimits withThreads(int value) {
        return new ServiceLimits(maxBodyBytes, maxPlayers, maxSimulationRounds, maxSimulationRolls, maxLogRounds,
                value, queueCapacity, requestTimeout, responseTimeout, idleTimeout,
                maxConnections, maxSessionAge, maxConcurrentSimulations);
    }

    /** Returns a copy with other connection timeouts. */
    public ServiceLimits withTimeouts(Duration request, Duration response, Duration idle) {
        return new ServiceLimits(maxBodyBytes, maxPlayers, maxSimulationRounds, maxSimulationRolls, maxLogRounds,
                threads, queueCapacity, request, response, idle,
                maxConnections, maxSessionAge, maxConcurrentSimulations);
    }

    /** Returns a copy with another session lifetime. */
    public ServiceLimits withMaxSessionAge(Duration value) {
        return new ServiceLimits(maxBodyBytes, maxPlayers, maxSimulationRounds, maxSimulationRolls, maxLogRounds,
                threads, queueCapacity, requestTimeout, responseTimeout, idleTimeout,
                maxConnections, value, maxConcurrentSimulations);
    }

    private static void positive(long v, String name) {
        if (v < 1) {
            throw new IllegalArgumentException(name + " must be positive, got " + v);
        }
    }

    private static void positive(Duration d, String name) {
        Objects.requireNonNull(d, name);
        if (d.isNegative() || d.isZero()) {
            throw new IllegalArgumentException(name + " must be positive, got " + d);
        }
    }
}
