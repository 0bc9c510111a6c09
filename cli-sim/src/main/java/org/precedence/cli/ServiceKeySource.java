package org.precedence.cli;

import java.nio.file.Path;
import java.util.Map;
import org.precedence.runtime.service.KeyFiles;
import org.precedence.runtime.service.KeyRing;

/**
 * Where {@code serve} takes its keys from, in this order: the {@code --key-file} given; else the
 * {@value KeyFiles#ENVIRONMENT_VARIABLE} environment variable; else the default file
 * {@code ~/.precedence/service.keys}, created with one fresh key on first start.
 */
final class ServiceKeySource {
    /** The keys and a description of where they came from (never the keys themselves). */
    record Loaded(KeyRing ring, String origin) {
    }

    private ServiceKeySource() {
    }

    static Path defaultFile() {
        return Path.of(System.getProperty("user.home"), ".precedence", "service.keys");
    }

    static Loaded load(Path keyFile, Map<String, String> environment) {
        if (keyFile != null) {
            return new Loaded(KeyFiles.loadOrCreate(keyFile), "key file " + keyFile);
        }
        String env = environment.get(KeyFiles.ENVIRONMENT_VARIABLE);
        if (env != null && !env.isBlank()) {
            return new Loaded(KeyFiles.parse(env, "environment variable " + KeyFiles.ENVIRONMENT_VARIABLE),
                    "environment variable " + KeyFiles.ENVIRONMENT_VARIABLE);
        }
        Path file = defaultFile();
        return new Loaded(KeyFiles.loadOrCreate(file), "key file " + file);
    }
}
