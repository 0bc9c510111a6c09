package org.precedence.runtime.service;

import java.nio.ByteBuffer;
import java.security.GeneralSecurityException;
import java.security.SecureRandom;
import java.time.Instant;
import java.util.Base64;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import javax.crypto.AEADBadTagException;
import javax.crypto.Cipher;
import javax.crypto.spec.GCMParameterSpec;
import org.precedence.api.SessionSeed;

/**
 * Seals {@link SessionClaims} into an opaque session token and opens it again, with AES-256-GCM
 * (NIST SP 800-38D) from the JDK. A token is unpadded base64url (RFC 4648 §5) of:
 *
 * <pre>
 *   offset  length  field
 *   0       1       format version, 1
 *   1       4       key id, unsigned big-endian
 *   5       12      nonce, fresh from SecureRandom for every token
 *   17      61      AES-GCM ciphertext of the 45-byte claims, then the 16-byte tag
 * </pre>
 *
 * The first 5 bytes are the additional authenticated data, so a changed version or key id
 * fails authentication like a changed ciphertext. Claims, 45 bytes: seed (32), players (2,
 * unsigned big-endian), mode code (1), rule code (1), convention code (1), created-at
 * (8, seconds since 1970-01-01T00:00:00Z, signed big-endian); codes as in {@link SessionClaims}.
 *
 * <p>Random 96-bit nonces keep the GCM nonce-reuse probability negligible for up to 2^32
 * tokens per key (SP 800-38D §8.3); rotate keys long before that.
 */
final class TokenSealer {
    static final byte VERSION = 1;
    static final int HEADER_BYTES = 5;
    static final int NONCE_BYTES = 12;
    static final int TAG_BITS = 128;
    static final int CLAIMS_BYTES = 32 + 2 + 1 + 1 + 1 + 8;
    static final int TOKEN_BYTES = HEADER_BYTES + NONCE_BYTES + CLAIMS_BYTES + TAG_BITS / 8;
    static final int TOKEN_CHARS = (TOKEN_BYTES * 8 + 5) / 6;

    private static final String TRANSFORMATION = "AES/GCM/NoPadding";
    private static final Base64.Encoder ENCODER = Base64.getUrlEncoder().withoutPadding();
    private static final Base64.Decoder DECODER = Base64.getUrlDecoder();

    private final KeyRing ring;
    private final Consumer<byte[]> nonces;
    // Opening is the hot path (every round request); a Cipher per thread avoids the provider
    // lookup each time. Sealing makes a fresh Cipher, since GCM forbids re-initialising an
    // encrypting Cipher with a key and nonce it has just used.
    private final ThreadLocal<Cipher> decrypters = ThreadLocal.withInitial(TokenSealer::newCipher);

    TokenSealer(KeyRing ring) {
        this(ring, new SecureRandom()::nextBytes);
    }

    /** @param nonces fills an array with a fresh nonce (tests pass a fixed one) */
    TokenSealer(KeyRing ring, Consumer<byte[]> nonces) {
        this.ring = ring;
        this.nonces = nonces;
    }

    KeyRing ring() {
        return ring;
    }

    /** Seals the claims under the ring's newest key. */
    String seal(SessionClaims claims) {
        ServiceKey key = ring.sealingKey();
        ByteBuffer token = ByteBuffer.allocate(TOKEN_BYTES);
        token.put(VERSION).putInt(key.id());
        byte[] nonce = new byte[NONCE_BYTES];
        nonces.accept(nonce);
        token.put(nonce);
        try {
            Cipher cipher = newCipher();
            cipher.init(Cipher.ENCRYPT_MODE, key.secretKey(), new GCMParameterSpec(TAG_BITS, nonce));
            cipher.updateAAD(token.array(), 0, HEADER_BYTES);
            cipher.doFinal(ByteBuffer.wrap(encodeClaims(claims)), token);
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("AES-GCM sealing failed", e);
        }
        return ENCODER.encodeToString(token.array());
    }

    /**
     * Opens a token.
     *
     * @throws ApiException {@code invalid_token} if it is malformed, sealed under a key this ring
     *                      does not hold, or fails authentication (altered or forged)
     */
    SessionClaims open(String token) {
        if (token.length() != TOKEN_CHARS) {
            throw ApiException.invalidToken("a session token has exactly " + TOKEN_CHARS
                    + " base64url characters, got " + token.length());
        }
        byte[] raw;
        try {
            raw = DECODER.decode(token);
        } catch (IllegalArgumentException e) {
            throw ApiException.invalidToken("a session token is base64url (A-Z a-z 0-9 - _); this one is not");
        }
        if (raw.length != TOKEN_BYTES || raw[0] != VERSION) {
            throw ApiException.invalidToken("unknown session token format version " + (raw[0] & 0xFF)
                    + "; this server reads version " + VERSION);
        }
        int keyId = ByteBuffer.wrap(raw, 1, 4).getInt();
        Optional<ServiceKey> key = ring.find(keyId);
        if (key.isEmpty()) {
            throw ApiException.invalidToken("the token names key id " + Integer.toUnsignedString(keyId)
                    + ", which this server does not hold (forged, or sealed under a key since retired)");
        }
        byte[] claims;
        try {
            Cipher cipher = decrypters.get();
            cipher.init(Cipher.DECRYPT_MODE, key.get().secretKey(),
                    new GCMParameterSpec(TAG_BITS, raw, HEADER_BYTES, NONCE_BYTES));
            cipher.updateAAD(raw, 0, HEADER_BYTES);
            claims = cipher.doFinal(raw, HEADER_BYTES + NONCE_BYTES, raw.length - HEADER_BYTES - NONCE_BYTES);
        } catch (AEADBadTagException e) {
            throw ApiException.invalidToken("the session token failed authentication: it was altered or forged");
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("AES-GCM opening failed", e);
        }
        return decodeClaims(claims);
    }

    static byte[] encodeClaims(SessionClaims c) {
        ByteBuffer b = ByteBuffer.allocate(CLAIMS_BYTES);
        b.put(c.seed().bytes());
        b.putShort((short) c.players());
        b.put(code(SessionClaims.MODE_CODES, c.mode()));
        b.put(code(SessionClaims.RULE_CODES, c.rule()));
        b.put(code(SessionClaims.CONVENTION_CODES, c.convention()));
        b.putLong(c.createdAt().getEpochSecond());
        return b.array();
    }

    static SessionClaims decodeClaims(byte[] claims) {
        // Authenticated bytes come from this server's own sealing; a failure here means a key
        // was shared with a program that writes a different layout.
        ByteBuffer b = ByteBuffer.wrap(claims);
        byte[] seed = new byte[SessionSeed.BYTES];
        b.get(seed);
        int players = Short.toUnsignedInt(b.getShort());
        try {
            return new SessionClaims(SessionSeed.ofBytes(seed), players,
                    decode(SessionClaims.MODE_CODES, b.get()),
                    decode(SessionClaims.RULE_CODES, b.get()),
                    decode(SessionClaims.CONVENTION_CODES, b.get()),
                    Instant.ofEpochSecond(b.getLong()));
        } catch (IllegalArgumentException e) {
            throw ApiException.invalidToken("the session token authenticates but its contents are not valid: "
                    + e.getMessage());
        }
    }

    private static <E> byte code(List<E> codes, E value) {
        return (byte) (codes.indexOf(value) + 1);
    }

    private static <E> E decode(List<E> codes, byte code) {
        int i = (code & 0xFF) - 1;
        if (i < 0 || i >= codes.size()) {
            throw new IllegalArgumentException("unknown code " + (code & 0xFF));
        }
        return codes.get(i);
    }

    private static Cipher newCipher() {
        try {
            return Cipher.getInstance(TRANSFORMATION);
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("every Java platform must provide " + TRANSFORMATION, e);
        }
    }
}
