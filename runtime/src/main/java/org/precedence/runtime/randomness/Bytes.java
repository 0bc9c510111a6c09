package org.precedence.runtime.randomness;

/** Little-endian 64-bit reads and writes, the byte order of every layout in the roll spec. */
final class Bytes {
    private Bytes() {
    }

    static long readLongLE(byte[] b, int off) {
        long v = 0;
        for (int i = 7; i >= 0; i--) {
            v = (v << 8) | (b[off + i] & 0xFFL);
        }
        return v;
    }

    static void writeLongLE(byte[] b, int off, long v) {
        for (int i = 0; i < 8; i++) {
            b[off + i] = (byte) (v >>> (8 * i));
        }
    }
}
