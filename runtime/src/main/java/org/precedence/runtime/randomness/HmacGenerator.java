package org.precedence.runtime.randomness;

import java.security.InvalidKeyException;
import java.security.NoSuchAlgorithmException;
import javax.crypto.Mac;
import javax.crypto.ShortBufferException;
import javax.crypto.spec.SecretKeySpec;

/**
 * Secure mode: the block at counter (c0, c1, c2, c3) is HMAC-SHA256 (RFC 2104, FIPS 198-1 over
 * FIPS 180-4) keyed by the derived 32-byte key, of the 32-byte message c0 ‖ c1 ‖ c2 ‖ c3, each
 * word little-endian; the 32-byte tag is read as four little-endian words. HMAC-SHA256 is a
 * pseudo-random function, so observed rounds reveal nothing about other rounds.
 *
 * <p>{@link Mac} is not thread-safe: each thread keeps its own keyed clone.
 */
final class HmacGenerator extends RollGenerator {
    private static final String ALGORITHM = "HmacSHA256";

    private final Mac prototype;
    private final ThreadLocal<Scratch> scratch;

    HmacGenerator(byte[] key) {
        this.prototype = keyedMac(key);
        this.scratch = ThreadLocal.withInitial(() -> new Scratch(clone(prototype)));
    }

    private static final class Scratch {
        final Mac mac;
        final byte[] message = new byte[32];
        final byte[] tag = new byte[32];

        Scratch(Mac mac) {
            this.mac = mac;
        }
    }

    static Mac keyedMac(byte[] key) {
        try {
            Mac mac = Mac.getInstance(ALGORITHM);
            mac.init(new SecretKeySpec(key, ALGORITHM));
            return mac;
        } catch (NoSuchAlgorithmException | InvalidKeyException e) {
            throw new IllegalStateException("every Java platform must provide " + ALGORITHM, e);
        }
    }

    private static Mac clone(Mac mac) {
        try {
            return (Mac) mac.clone();
        } catch (CloneNotSupportedException e) {
            throw new IllegalStateException(ALGORITHM + " cannot be cloned on this platform", e);
        }
    }

    /** Returns HMAC-SHA256(key, message): the primitive checked against RFC 4231. */
    static byte[] hmac(byte[] key, byte[] message) {
        return keyedMac(key).doFinal(message);
    }

    @Override
    public String algorithmId() {
        return SECURE_ID;
    }

    @Override
    public void block(long c0, long c1, long c2, long c3, long[] out) {
        Scratch s = scratch.get();
        Bytes.writeLongLE(s.message, 0, c0);
        Bytes.writeLongLE(s.message, 8, c1);
        Bytes.writeLongLE(s.message, 16, c2);
        Bytes.writeLongLE(s.message, 24, c3);
        try {
            s.mac.update(s.message);
            s.mac.doFinal(s.tag, 0);
        } catch (ShortBufferException e) {
            throw new IllegalStateException("HMAC-SHA256 tag is 32 bytes", e);
        }
        out[0] = Bytes.readLongLE(s.tag, 0);
        out[1] = Bytes.readLongLE(s.tag, 8);
        out[2] = Bytes.readLongLE(s.tag, 16);
        out[3] = Bytes.readLongLE(s.tag, 24);
    }
}
