package org.precedence.runtime.service;

import java.security.MessageDigest;
import java.util.Arrays;
import java.util.Objects;
import javax.crypto.SecretKey;
import javax.crypto.spec.SecretKeySpec;

/**
 * One server key: a positive id, written into every token it seals so that a ring of several
 * keys knows which one opens it, and 32 bytes of AES-256 key material.
 */
public final class ServiceKey {
    /** Length of the key material in bytes (AES-256). */
    public static final int BYTES = 32;

    private final int id;
    private final byte[] material;

    /**
     * @param id       the key id, 1 to {@link Integer#MAX_VALUE}
     * @param material exactly {@value #BYTES} bytes (copied)
     */
    public ServiceKey(int id, byte[] material) {
        Objects.requireNonNull(material, "material");
        if (id < 1) {
            throw new IllegalArgumentException("a key id is a positive integer, got " + id);
        }
        if (material.length != BYTES) {
            throw new IllegalArgumentException("key " + id + " must have exactly " + BYTES
                    + " bytes of material, got " + material.length);
        }
        this.id = id;
        this.material = material.clone();
    }

    /** Returns the key id. */
    public int id() {
        return id;
    }

    /** Returns a copy of the key material. */
    public byte[] material() {
        return material.clone();
    }

    SecretKey secretKey() {
        return new SecretKeySpec(material, "AES");
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ServiceKey k && k.id == id && MessageDigest.isEqual(k.material, material);
    }

    @Override
    public int hashCode() {
        return 31 * id + Arrays.hashCode(material);
    }

    /** Never prints the material. */
    @Override
    public String toString() {
        return "ServiceKey[id=" + id + "]";
    }
}
