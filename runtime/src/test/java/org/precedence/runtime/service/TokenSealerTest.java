package org.precedence.runtime.service;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.ByteBuffer;
import java.time.Instant;
import java.util.Arrays;
import java.util.Base64;
import javax.crypto.Cipher;
import javax.crypto.spec.GCMParameterSpec;
import javax.crypto.spec.SecretKeySpec;
import org.junit.jupiter.api.Test;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.SessionSeed;

class TokenSealerTest {
    private static final ServiceKey KEY_1 = key(1, 0x11);
    private static final ServiceKey KEY_2 = key(2, 0x22);
    private static final SessionClaims CLAIMS = new SessionClaims(SessionSeed.fromText("harbour-night-7"), 5,
            RandomnessMode.SECURE, OrderRule.SNAKE, RankingConvention.HIGHEST_FIRST,
            Instant.parse("2026-03-14T18:30:00Z"));

    @Test
    void open_sealedToken_returnsSameClaims() {
        TokenSealer sealer = new TokenSealer(KeyRing.of(KEY_1));
        String token = sealer.seal(CLAIMS);
        assertEquals(TokenSealer.TOKEN_CHARS, token.length());
        assertEquals(CLAIMS, sealer.open(token));
    }

    @Test
    void seal_twice_usesFreshNonces() {
        TokenSealer sealer = new TokenSealer(KeyRing.of(KEY_1));
        assertNotEquals(sealer.seal(CLAIMS), sealer.seal(CLAIMS));
    }

    /** The documented layout, checked by opening a token with a bare JDK cipher, not the sealer. */
    @Test
    void seal_fixedNonce_followsDocumentedLayout() throws Exception {
        byte[] nonce = new byte[12];
        Arrays.fill(nonce, (byte) 0x5a);
        TokenSealer sealer = new TokenSealer(KeyRing.of(KEY_1, KEY_2), b -> System.arraycopy(nonce, 0, b, 0, 12));
        byte[] raw = Base64.getUrlDecoder().decode(sealer.seal(CLAIMS));

        assertEquals(78, raw.length);
        assertEquals(1, raw[0]);
        assertEquals(2, ByteBuffer.wrap(raw, 1, 4).getInt(), "sealed under the newest key");
        assertArrayEquals(nonce, Arrays.copyOfRange(raw, 5, 17));

        Cipher c = Cipher.getInstance("AES/GCM/NoPadding");
        c.init(Cipher.DECRYPT_MODE, new SecretKeySpec(KEY_2.material(), "AES"), new GCMParameterSpec(128, nonce));
        c.updateAAD(raw, 0, 5);
        ByteBuffer claims = ByteBuffer.wrap(c.doFinal(raw, 17, raw.length - 17));
        byte[] seed = new byte[32];
        claims.get(seed);
        assertArrayEquals(CLAIMS.seed().bytes(), seed);
        assertEquals(5, claims.getShort());
        assertEquals(2, claims.get(), "mode code: secure");
        assertEquals(3, claims.get(), "rule code: snake");
        assertEquals(2, claims.get(), "convention code: highest_first");
        assertEquals(Instant.parse("2026-03-14T18:30:00Z").getEpochSecond(), claims.getLong());
        assertEquals(0, claims.remaining());
    }

    @Test
    void open_anyAlteredByte_isRefused() {
        TokenSealer sealer = new TokenSealer(KeyRing.of(KEY_1));
        byte[] raw = Base64.getUrlDecoder().decode(sealer.seal(CLAIMS));
        for (int i = 0; i < raw.length; i++) {
            byte[] altered = raw.clone();
            altered[i] ^= 0x01;
            String token = Base64.getUrlEncoder().withoutPadding().encodeToString(altered);
            ApiException e = assertThrows(ApiException.class, () -> sealer.open(token), "byte " + i);
            assertEquals(400, e.status());
            assertEquals("invalid_token", e.error());
        }
    }

    @Test
    void open_tokenSealedUnderForeignKeyWithSameId_isRefused() {
        String forged = new TokenSealer(KeyRing.of(key(1, 0x77))).seal(CLAIMS);
        ApiException e = assertThrows(ApiException.class, () -> new TokenSealer(KeyRing.of(KEY_1)).open(forged));
        assertTrue(e.detail().contains("altered or forged"), e.detail());
    }

    @Test
    void open_afterRotation_oldTokensOpenNewOnesUseNewKey() {
        String old = new TokenSealer(KeyRing.of(KEY_1)).seal(CLAIMS);
        TokenSealer rotated = new TokenSealer(KeyRing.of(KEY_1, KEY_2));
        assertEquals(CLAIMS, rotated.open(old));
        String fresh = rotated.seal(CLAIMS);
        assertEquals(2, ByteBuffer.wrap(Base64.getUrlDecoder().decode(fresh), 1, 4).getInt());

        TokenSealer retired = new TokenSealer(KeyRing.of(KEY_2));
        assertEquals(CLAIMS, retired.open(fresh));
        ApiException e = assertThrows(ApiException.class, () -> retired.open(old));
        assertTrue(e.detail().contains("key id 1"), e.detail());
    }

    @Test
    void open_wrongLengthOrAlphabet_isRefused() {
        TokenSealer sealer = new TokenSealer(KeyRing.of(KEY_1));
        String token = sealer.seal(CLAIMS);
        assertEquals("invalid_token", assertThrows(ApiException.class, () -> sealer.open(token + "A")).error());
        assertEquals("invalid_token", assertThrows(ApiException.class, () -> sealer.open("")).error());
        String bad = "*" + token.substring(1);
        assertEquals("invalid_token", assertThrows(ApiException.class, () -> sealer.open(bad)).error());
    }

    static ServiceKey key(int id, int fill) {
        byte[] m = new byte[32];
        Arrays.fill(m, (byte) fill);
        return new ServiceKey(id, m);
    }
}
