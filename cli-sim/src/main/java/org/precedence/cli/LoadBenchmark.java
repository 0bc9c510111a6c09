package org.precedence.cli;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.net.InetSocketAddress;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderProvider;
import org.precedence.api.TurnOrderSource;
import org.precedence.runtime.service.RandomizerService;

/**
 * Load on a running service over loopback: {@code clients} threads, each on its own keep-alive
 * connection, ask for distinct rounds of one session until {@code requests} are done. Each
 * latency is recorded exactly (one long per request) and the percentiles are read from the
 * sorted array, so no histogram library is needed. Every 500th response is parsed and checked
 * against the library's round for the session; a mismatch counts as an error.
 */
final class LoadBenchmark {
    /** What one run measured. */
    record Result(int requests, int clients, int warmup, double seconds, long errors, String firstError,
            long checked, double p50Millis, double p90Millis, double p99Millis, double p999Millis, double maxMillis) {
        double perSecond() {
            return requests / seconds;
        }

        Result withWarmup(int warmupRequests) {
            return new Result(requests, clients, warmupRequests, seconds, errors, firstError, checked, p50Millis,
                    p90Millis, p99Millis, p999Millis, maxMillis);
        }
    }

    private static final int CHECK_EVERY = 500;

    private LoadBenchmark() {
    }

    static Result run(RandomizerService service, TurnOrderProvider provider, int players, RandomnessMode mode,
            int requests, int clients, int warmup) throws IOException, InterruptedException {
        InetSocketAddress address = service.address();
        String token;
        String seedHex;
        token = createSession(address, players, mode);
        seedHex = reveal(address, token);
        TurnOrderSource library = provider.open(new SessionSpec(SessionSeed.fromHex(seedHex), mode,
                OrderRule.FRESH_EACH_ROUND, RankingConvention.LOWEST_FIRST));
        // Warm the server and the JIT the same way, on rounds after the measured range.
        phase(address, token, library, players, warmup, requests, clients);
        return phase(address, token, library, players, requests, 0, clients).withWarmup(warmup);
    }

    private static Result phase(InetSocketAddress address, String token, TurnOrderSource library, int players,
            int requests, long firstRound, int clients) throws InterruptedException {

        long[] latency = new long[requests];
        AtomicLong next = new AtomicLong();
        AtomicLong errors = new AtomicLong();
        AtomicLong checked = new AtomicLong();
        AtomicReference<String> firstError = new AtomicReference<>();
        CountDownLatch ready = new CountDownLatch(clients);
        CountDownLatch go = new CountDownLatch(1);
        List<Thread> threads = new ArrayList<>();
        String prefix = "/v1/sessions/" + token + "/rounds/";
        for (int c = 0; c < clients; c++) {
            Thread t = new Thread(() -> {
                try (KeepAliveClient client = new KeepAliveClient(address, 30_000)) {
                    ready.countDown();
                    go.await();
                    long i;
                    while ((i = next.getAndIncrement()) < requests) {
                        long start = System.nanoTime();
                        KeepAliveClient.Response r = client.get(prefix + (firstRound + i));
                        latency[(int) i] = System.nanoTime() - start;
                        if (r.status() != 200) {
                            fail(errors, firstError, "round " + i + ": HTTP " + r.status() + " "
                                    + new String(r.body(), StandardCharsets.UTF_8));
                        } else if (i % CHECK_EVERY == 0) {
                            checked.incrementAndGet();
                            String problem = check(r.body(), library.roll(firstRound + i, players));
                            if (problem != null) {
                                fail(errors, firstError, "round " + i + ": " + problem);
                            }
                        }
                    }
                } catch (IOException e) {
                    fail(errors, firstError, "client connection failed: " + e.getMessage());
                    ready.countDown();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }, "bench-client-" + c);
            t.setDaemon(true);
            threads.add(t);
            t.start();
        }
        ready.await();
        long start = System.nanoTime();
        go.countDown();
        for (Thread t : threads) {
            t.join();
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        long done = Math.min(next.get(), requests);
        long missing = requests - done;
        long[] sorted = Arrays.copyOf(latency, (int) done);
        Arrays.sort(sorted);
        return new Result(requests, clients, 0, seconds, errors.get() + missing, firstError.get(), checked.get(),
                percentile(sorted, 0.50), percentile(sorted, 0.90), percentile(sorted, 0.99),
                percentile(sorted, 0.999), sorted.length == 0 ? 0 : sorted[sorted.length - 1] / 1e6);
    }

    /** The nearest-rank percentile (the smallest value with at least q of the data at or below it). */
    static double percentile(long[] sorted, double q) {
        if (sorted.length == 0) {
            return 0;
        }
        int rank = (int) Math.ceil(q * sorted.length);
        return sorted[Math.max(0, rank - 1)] / 1e6;
    }

    private static void fail(AtomicLong errors, AtomicReference<String> first, String message) {
        errors.incrementAndGet();
        first.compareAndSet(null, message);
    }

    private static String check(byte[] body, RoundResult expected) {
        JsonObject o = JsonParser.parseString(new String(body, StandardCharsets.UTF_8)).getAsJsonObject();
        List<Integer> order = new ArrayList<>();
        o.getAsJsonArray("order").forEach(e -> order.add(e.getAsInt()));
        if (!order.equals(expected.order())) {
            return "served order " + order + " but the library rolls " + expected.order();
        }
        return null;
    }

    private static String createSession(InetSocketAddress address, int players, RandomnessMode mode)
            throws IOException, InterruptedException {
        String body = "{\"players\":" + players + ",\"mode\":\"" + mode.name().toLowerCase(java.util.Locale.ROOT)
                + "\"}";
        JsonObject o = post(address, "/v1/sessions", body, 201);
        return o.get("token").getAsString();
    }

    private static String reveal(InetSocketAddress address, String token) throws IOException, InterruptedException {
        return post(address, "/v1/sessions/" + token + "/reveal", "", 200).get("seed").getAsString();
    }

    private static JsonObject post(InetSocketAddress address, String path, String body, int expect)
            throws IOException, InterruptedException {
        java.net.http.HttpClient http = java.net.http.HttpClient.newHttpClient();
        java.net.http.HttpResponse<String> r = http.send(java.net.http.HttpRequest.newBuilder(
                        java.net.URI.create("http://" + address.getAddress().getHostAddress() + ":" + address.getPort()
                                + path))
                .header("Content-Type", "application/json")
                .POST(java.net.http.HttpRequest.BodyPublishers.ofString(body)).build(),
                java.net.http.HttpResponse.BodyHandlers.ofString());
        if (r.statusCode() != expect) {
            throw new IOException("POST " + path + " answered " + r.statusCode() + ": " + r.body());
        }
        return JsonParser.parseString(r.body()).getAsJsonObject();
    }
}
