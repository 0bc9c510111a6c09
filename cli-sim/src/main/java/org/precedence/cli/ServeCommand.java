package org.precedence.cli;

import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.UnknownHostException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import org.precedence.api.RandomnessMode;
import org.precedence.runtime.provider.FairDiceProvider;
import org.precedence.runtime.service.KeyFiles;
import org.precedence.runtime.service.KeyRing;
import org.precedence.runtime.service.RandomizerService;
import org.precedence.runtime.service.ServiceLimits;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code precedence serve}: runs the randomizer service until stopped, or adds a key to the key
 * file ({@code --add-key}), or measures the service under load ({@code --bench}).
 */
@Command(name = "serve", mixinStandardHelpOptions = true,
        description = {"Serve seeded, verifiable turn orders over HTTP/JSON "
                + "(endpoints under /v1, see docs/service.md).",
            "Keys: --key-file FILE, else the environment variable " + KeyFiles.ENVIRONMENT_VARIABLE
                    + ", else ~/.precedence/service.keys (created on first start). Replicas share the key file."})
public final class ServeCommand implements Callable<Integer> {
    static final int MAX_BENCH_REQUESTS = 1_000_000;
    static final int MAX_BENCH_CLIENTS = 256;

    @Spec
    CommandSpec spec;

    @Mixin
    FormatOption format = new FormatOption();

    @Option(names = "--port", paramLabel = "P", defaultValue = "8080",
            description = "TCP port, 0 for any free port (default: ${DEFAULT-VALUE}).")
    int port;

    @Option(names = "--bind", paramLabel = "ADDRESS", defaultValue = "127.0.0.1",
            description = "Address to listen on (default: ${DEFAULT-VALUE}, loopback only).")
    String bind;

    @Option(names = "--key-file", paramLabel = "FILE",
            description = "Key ring file: read, or created owner-only with one fresh key if absent.")
    Path keyFile;

    @Option(names = "--add-key",
            description = "Append a fresh key to the key file (it seals new sessions once the service "
                    + "restarts with the file) and exit.")
    boolean addKey;

    @Option(names = "--threads", paramLabel = "N",
            description = "Worker threads (default: twice the processors, at least 4).")
    Integer threads;

    @Option(names = "--bench", description = "Measure the service on loopback under load and exit.")
    boolean bench;

    @Option(names = "--requests", paramLabel = "N", defaultValue = "100000",
            description = "Benchmark: measured round requests (default: ${DEFAULT-VALUE}, at most " + MAX_BENCH_REQUESTS
                    + ").")
    int requests;

    @Option(names = "--clients", paramLabel = "N", defaultValue = "32",
            description = "Benchmark: concurrent clients, one connection each (default: ${DEFAULT-VALUE}, at most "
                    + MAX_BENCH_CLIENTS + ").")
    int clients;

    @Option(names = "--players", paramLabel = "N", defaultValue = "4",
            description = "Benchmark: players in the session (default: ${DEFAULT-VALUE}).")
    int players;

    @Option(names = "--mode", paramLabel = "MODE", defaultValue = "secure",
            description = "Benchmark: session randomness mode, fast or secure (default: ${DEFAULT-VALUE}).")
    RandomnessMode mode;

    @Option(names = "--min-rate", paramLabel = "R", defaultValue = "10000",
            description = "Benchmark: requests per second below which the run fails with exit code 1 "
                    + "(default: ${DEFAULT-VALUE}).")
    double minRate;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        if (port < 0 || port > 65535) {
            throw new UserInputException("--port must be 0..65535, got " + port);
        }
        if (threads != null && (threads < 1 || threads > 1024)) {
            throw new UserInputException("--threads must be 1..1024, got " + threads);
        }
        if (addKey) {
            return addKey(out);
        }
        FairDiceProvider provider = new FairDiceProvider();
        ServiceLimits limits = ServiceLimits.defaults();
        if (threads != null) {
            limits = limits.withThreads(threads);
        }
        if (bench) {
            return bench(out, provider, limits);
        }
        InetAddress address = address(bind);
        ServiceKeySource.Loaded keys = ServiceKeySource.load(keyFile, System.getenv());
        RandomizerService service = start(provider, limits, keys.ring(), new InetSocketAddress(address, port));
        CountDownLatch stopped = new CountDownLatch(1);
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            service.close();
            stopped.countDown();
        }, "precedence-serve-shutdown"));
        out.println("precedence service listening on " + service.baseUri() + " (" + keys.origin()
                + ", sealing key " + keys.ring().sealingKey().id() + ", provider " + provider.name() + ")");
        if (!address.isLoopbackAddress()) {
            out.println("note: listening beyond loopback; put a TLS-terminating proxy in front, "
                    + "tokens are bearer secrets");
        }
        out.flush();
        stopped.await();
        return ExitCodes.OK;
    }

    private int addKey(PrintWriter out) {
        Path file = keyFile != null ? keyFile : ServiceKeySource.defaultFile();
        if (!java.nio.file.Files.exists(file)) {
            throw new UserInputException("--add-key needs an existing key file; " + file
                    + " does not exist (start the service once, or give --key-file)");
        }
        KeyRing ring = KeyFiles.addKey(file);
        out.println("added key " + ring.sealingKey().id() + " to " + file + "; it seals new sessions once replicas "
                + "restart with this file (" + ring.keys().size() + " keys held)");
        return ExitCodes.OK;
    }

    private int bench(PrintWriter out, FairDiceProvider provider, ServiceLimits limits) throws Exception {
        if (requests < 1 || requests > MAX_BENCH_REQUESTS) {
            throw new UserInputException("--requests must be 1.." + MAX_BENCH_REQUESTS + ", got " + requests);
        }
        if (clients < 1 || clients > MAX_BENCH_CLIENTS) {
            throw new UserInputException("--clients must be 1.." + MAX_BENCH_CLIENTS + ", got " + clients);
        }
        if (players < 2 || players > provider.maxPlayers()) {
            throw new UserInputException("--players must be 2.." + provider.maxPlayers() + ", got " + players);
        }
        // Loopback only and an in-memory key: a benchmark never exposes or touches real keys.
        int warmup = Math.min(20_000, Math.max(1_000, requests / 5));
        LoadBenchmark.Result r;
        try (RandomizerService service = start(provider, limits, KeyRing.of(KeyFiles.generate(1)),
                new InetSocketAddress(InetAddress.getLoopbackAddress(), 0))) {
            r = LoadBenchmark.run(service, provider, players, mode, requests, clients, warmup);
        }
        boolean passed = r.errors() == 0 && r.perSecond() >= minRate;
        if (format.json()) {
            com.google.gson.JsonObject o = new com.google.gson.JsonObject();
            o.addProperty("requests", r.requests());
            o.addProperty("clients", r.clients());
            o.addProperty("workerThreads", limits.threads());
            o.addProperty("players", players);
            o.addProperty("mode", mode.name().toLowerCase(Locale.ROOT));
            o.addProperty("warmupRequests", r.warmup());
            o.addProperty("seconds", r.seconds());
            o.addProperty("requestsPerSecond", r.perSecond());
            o.addProperty("errors", r.errors());
            o.addProperty("checkedAgainstLibrary", r.checked());
            o.addProperty("p50Millis", r.p50Millis());
            o.addProperty("p90Millis", r.p90Millis());
            o.addProperty("p99Millis", r.p99Millis());
            o.addProperty("p999Millis", r.p999Millis());
            o.addProperty("maxMillis", r.maxMillis());
            o.addProperty("minRate", minRate);
            o.addProperty("passed", passed);
            out.println(o);
        } else {
            out.printf(Locale.ROOT, "load: %,d round requests, %d clients (one keep-alive connection each), "
                    + "%d workers, %d players, %s mode, after %,d warm-up requests%n", r.requests(), r.clients(),
                    limits.threads(), players, mode.name().toLowerCase(Locale.ROOT), r.warmup());
            out.printf(Locale.ROOT, "throughput: %,.0f requests/s (%.2f s)%n", r.perSecond(), r.seconds());
            out.printf(Locale.ROOT, "errors: %d (%d responses checked against the library)%n", r.errors(), r.checked());
            out.printf(Locale.ROOT, "latency ms: p50 %.3f  p90 %.3f  p99 %.3f  p99.9 %.3f  max %.3f%n",
                    r.p50Millis(), r.p90Millis(), r.p99Millis(), r.p999Millis(), r.maxMillis());
            out.printf(Locale.ROOT, "target %,.0f requests/s with zero errors: %s%n", minRate,
                    passed ? "met" : "NOT met");
            if (r.firstError() != null) {
                out.println("first error: " + r.firstError());
            }
        }
        return passed ? ExitCodes.OK : ExitCodes.CHECK_FAILED;
    }

    private static RandomizerService start(FairDiceProvider provider, ServiceLimits limits, KeyRing keys,
            InetSocketAddress address) {
        try {
            return RandomizerService.builder().address(address).limits(limits).keys(keys)
                    .provider(provider).sets(provider.sets()).start();
        } catch (UncheckedIOException e) {
            throw new UserInputException(e.getMessage(), e);
        }
    }

    private static InetAddress address(String text) {
        try {
            return InetAddress.getByName(text);
        } catch (UnknownHostException e) {
            throw new UserInputException("--bind must be a local address such as 127.0.0.1 or ::1, got '" + text + "'");
        }
    }
}
