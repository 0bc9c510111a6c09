package org.precedence.runtime.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.precedence.runtime.service.ServiceClient.error;
import static org.precedence.runtime.service.ServiceClient.ok;

import java.net.http.HttpResponse;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderProvider;
import org.precedence.api.TurnOrderSource;

/** Simulations beyond the concurrency limit are refused with 503 busy, not queued behind workers. */
class SimulationGateTest {

    /** The test provider, except that round 1 waits until the test lets it go. */
    static final class HoldingProvider implements TurnOrderProvider {
        final TestBackends.Provider inner = new TestBackends.Provider();
        final CountDownLatch entered = new CountDownLatch(1);
        final CountDownLatch release = new CountDownLatch(1);

        @Override
        public TurnOrderSource open(SessionSpec spec) {
            TurnOrderSource source = inner.open(spec);
            return new TurnOrderSource() {
                @Override
                public SessionSpec spec() {
                    return spec;
                }

                @Override
                public RoundResult roll(long round, int playerCount) {
                    if (round == 1) {
                        entered.countDown();
                        try {
                            release.await(20, TimeUnit.SECONDS);
                        } catch (InterruptedException e) {
                            Thread.currentThread().interrupt();
                        }
                    }
                    return source.roll(round, playerCount);
                }
            };
        }

        @Override
        public int maxPlayers() {
            return inner.maxPlayers();
        }

        @Override
        public String name() {
            return "holding-test-provider";
        }
    }

    @Test
    void simulate_whileAnotherRuns_is503Busy() throws Exception {
        HoldingProvider provider = new HoldingProvider();
        try (RandomizerService service = RandomizerService.builder().keys(KeyRing.of(KeyFiles.generate(1)))
                .provider(provider).sets(new TestBackends.Sets()).limits(ServiceLimits.defaults().withThreads(4))
                .start()) {
            assertEquals(1, ServiceLimits.defaults().withThreads(4).maxConcurrentSimulations());
            ServiceClient client = new ServiceClient(service);
            String body = "{\"players\":3,\"rounds\":3,\"seed\":\"gate-test\"}";
            CompletableFuture<HttpResponse<String>> first =
                    CompletableFuture.supplyAsync(() -> client.post("/v1/simulate", body));
            provider.entered.await(20, TimeUnit.SECONDS);
            error(client.post("/v1/simulate", body), 503, "busy");
            // Round requests are not held up by the running simulation.
            ok(client.get("/v1/health"), 200);
            provider.release.countDown();
            ok(first.get(20, TimeUnit.SECONDS), 200);
            ok(client.post("/v1/simulate", body), 200);
        }
    }
}
