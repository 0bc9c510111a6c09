package org.precedence.runtime.service;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.HexFormat;
import javax.crypto.AEADBadTagException;
import javax.crypto.Cipher;
import javax.crypto.spec.GCMParameterSpec;
import javax.crypto.spec.SecretKeySpec;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The session tokens rest on the JDK's AES-GCM; this checks that cipher, as the token sealer
 * uses it ("AES/GCM/NoPadding", 96-bit nonce, 128-bit tag), against published vectors.
 *
 * <p>Source: the test cases of the GCM specification, "The Galois/Counter Mode of Operation
 * (GCM)", revised 2005, Appendix B, test cases 1, 2, 13, 14, 15 and 16 (the last four use
 * 256-bit keys, as our tokens do). The values were written down from memory, not copied from
 * a file; a wrong digit would make this test fail, not pass.
 */
class AesGcmKnownAnswerTest {
    private static final HexFormat HEX = HexFormat.of();

    @ParameterizedTest(name = "GCM spec test case {0}")
    @CsvSource({
        // case, key, nonce, plaintext, aad, ciphertext, tag
        "1, 00000000000000000000000000000000, 000000000000000000000000, , , , 58e2fccefa7e3061367f1d57a4e7455a",
        "2, 00000000000000000000000000000000, 000000000000000000000000, 00000000000000000000000000000000, , "
                + "0388dace60b6a392f328c2b971b2fe78, ab6e47d42cec13bdf53a67b21257bddf",
        "13, 0000000000000000000000000000000000000000000000000000000000000000, 000000000000000000000000, , , , "
                + "530f8afbc74536b9a963b4f1c4cb738b",
        "14, 0000000000000000000000000000000000000000000000000000000000000000, 000000000000000000000000, "
                + "00000000000000000000000000000000, , cea7403d4d606b6e074ec5d3baf39d18, d0d1c8a799996bf0265b98b5d48ab919",
        "15, feffe9928665731c6d6a8f9467308308feffe9928665731c6d6a8f9467308308, cafebabefacedbaddecaf888, "
                + "d9313225f88406e5a55909c5aff5269a86a7a9531534f7da2e4c303d8a318a721c3c0c95956809532fcf0e2449a6b525"
                + "b16aedf5aa0de657ba637b391aafd255, , "
                + "522dc1f099567d07f47f37a32a84427d643a8cdcbfe5c0c97598a2bd2555d1aa8cb08e48590dbb3da7b08b1056828838"
                + "c5f61e6393ba7a0abcc9f662898015ad, b094dac5d93471bdec1a502270e3cc6c",
        "16, feffe9928665731c6d6a8f9467308308feffe9928665731c6d6a8f9467308308, cafebabefacedbaddecaf888, "
                + "d9313225f88406e5a55909c5aff5269a86a7a9531534f7da2e4c303d8a318a721c3c0c95956809532fcf0e2449a6b525"
                + "b16aedf5aa0de657ba637b39, feedfacedeadbeeffeedfacedeadbeefabaddad2, "
                + "522dc1f099567d07f47f37a32a84427d643a8cdcbfe5c0c97598a2bd2555d1aa8cb08e48590dbb3da7b08b1056828838"
                + "c5f61e6393ba7a0abcc9f662, 76fc6ece0f4e1768cddf8853bb2d551b",
    })
    void jdkCipher_matchesSpecificationVectors(int testCase, String key, String nonce, String plaintext, String aad,
            String ciphertext, String tag) throws Exception {
        byte[] k = hex(key);
        byte[] iv = hex(nonce);
        byte[] p = hex(plaintext);
        byte[] a = hex(aad);
        byte[] expected = concat(hex(ciphertext), hex(tag));

        Cipher enc = Cipher.getInstance("AES/GCM/NoPadding");
        enc.init(Cipher.ENCRYPT_MODE, new SecretKeySpec(k, "AES"), new GCMParameterSpec(TokenSealer.TAG_BITS, iv));
        enc.updateAAD(a);
        assertArrayEquals(expected, enc.doFinal(p), "sealing, test case " + testCase);

        Cipher dec = Cipher.getInstance("AES/GCM/NoPadding");
        dec.init(Cipher.DECRYPT_MODE, new SecretKeySpec(k, "AES"), new GCMParameterSpec(TokenSealer.TAG_BITS, iv));
        dec.updateAAD(a);
        assertArrayEquals(p, dec.doFinal(expected), "opening, test case " + testCase);

        // The same vector with its last tag bit flipped must not open.
        byte[] altered = expected.clone();
        altered[altered.length - 1] ^= 1;
        Cipher bad = Cipher.getInstance("AES/GCM/NoPadding");
        bad.init(Cipher.DECRYPT_MODE, new SecretKeySpec(k, "AES"), new GCMParameterSpec(TokenSealer.TAG_BITS, iv));
        bad.updateAAD(a);
        assertThrows(AEADBadTagException.class, () -> bad.doFinal(altered));
    }

    private static byte[] hex(String s) {
        return s == null ? new byte[0] : HEX.parseHex(s.strip());
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] r = Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, r, a.length, b.length);
        return r;
    }
}
