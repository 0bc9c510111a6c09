package org.precedence.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.precedence.runtime.service.KeyFiles;

class ServeCommandTest {
    @TempDir
    Path dir;

    private static Object[] run(String... args) {
        return PrecedenceApplicationTest.run(args);
    }

    @Test
    void addKey_existingFile_appendsTheNewSealingKey() {
        Path file = dir.resolve("service.keys");
        KeyFiles.loadOrCreate(file);
        Object[] r = run("serve", "--key-file", file.toString(), "--add-key");
        assertEquals(ExitCodes.OK, r[0], (String) r[2]);
        assertTrue(((String) r[1]).contains("added key 2"), (String) r[1]);
        assertEquals(2, KeyFiles.load(file).sealingKey().id());
    }

    @Test
    void addKey_missingFile_exitsTwo() {
        Object[] r = run("serve", "--key-file", dir.resolve("absent.keys").toString(), "--add-key");
        assertEquals(ExitCodes.BAD_INPUT, r[0]);
        assertTrue(((String) r[2]).contains("does not exist"), (String) r[2]);
        assertFalse(Files.exists(dir.resolve("absent.keys")));
    }

    @Test
    void badOptions_exitTwoWithOneLine() {
        for (String[] args : new String[][] {{"serve", "--port", "70000"}, {"serve", "--port", "x"},
            {"serve", "--bench", "--requests", "0"}, {"serve", "--bench", "--clients", "1000"},
            {"serve", "--threads", "0"}, {"serve", "--bench", "--players", "1"}}) {
            Object[] r = run(args);
            assertEquals(ExitCodes.BAD_INPUT, r[0], String.join(" ", args));
            assertFalse(((String) r[2]).contains("\tat "), "no stack trace");
        }
    }

    @Test
    void serve_portInUse_exitsTwo() throws Exception {
        try (ServerSocket taken = new ServerSocket(0, 1, InetAddress.getLoopbackAddress())) {
            Object[] r = assertTimeoutPreemptively(Duration.ofSeconds(30), () -> run("serve", "--port",
                    Integer.toString(taken.getLocalPort()), "--key-file", dir.resolve("k").toString()));
            assertEquals(ExitCodes.BAD_INPUT, r[0]);
            assertTrue(((String) r[2]).contains("cannot listen"), (String) r[2]);
        }
    }

    @Test
    void keySource_order_fileThenEnvironmentThenDefault() {
        Path file = dir.resolve("k");
        assertTrue(ServiceKeySource.load(file, Map.of()).origin().contains(file.toString()));
        String env = "7:" + "Q".repeat(43);
        ServiceKeySource.Loaded fromEnv = ServiceKeySource.load(null, Map.of(KeyFiles.ENVIRONMENT_VARIABLE, env));
        assertEquals(7, fromEnv.ring().sealingKey().id());
        assertTrue(fromEnv.origin().contains(KeyFiles.ENVIRONMENT_VARIABLE));
    }

    /** A small run of the benchmark command: it must serve every request correctly. */
    @Test
    void bench_small_reportsZeroErrorsAsJson() {
        Object[] r = run("serve", "--bench", "--requests", "3000", "--clients", "4", "--min-rate", "0",
                "--format", "json");
        assertEquals(ExitCodes.OK, r[0], (String) r[2]);
        JsonObject o = JsonParser.parseString(((String) r[1]).strip()).getAsJsonObject();
        assertEquals(0, o.get("errors").getAsLong());
        assertEquals(3000, o.get("requests").getAsInt());
        assertEquals(6, o.get("checkedAgainstLibrary").getAsLong());
        assertTrue(o.get("p99Millis").getAsDouble() >= o.get("p50Millis").getAsDouble());
        assertTrue(o.get("passed").getAsBoolean());
    }

    @Test
    void percentile_nearestRank() {
        long[] ms = {1_000_000, 2_000_000, 3_000_000, 4_000_000};
        assertEquals(2.0, LoadBenchmark.percentile(ms, 0.5));
        assertEquals(4.0, LoadBenchmark.percentile(ms, 0.99));
        assertEquals(1.0, LoadBenchmark.percentile(ms, 0.01));
    }
}
