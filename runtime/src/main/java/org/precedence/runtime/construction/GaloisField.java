package org.precedence.runtime.construction;

/**
 * The field with q = p^e elements, as full addition and multiplication tables. Element
 * {@code v} stands for the polynomial whose coefficients are the base-p digits of v; products
 * are reduced modulo the first monic polynomial of degree e (in base-p order) for which the
 * table has no zero divisors — a finite ring without zero divisors is a field, so that test
 * both finds an irreducible polynomial and proves the tables form a field.
 */
final class GaloisField {
    private final int q;
    private final int p;
    private final int[] add;
    private final int[] mul;
    private final int[] neg;
    private final int[] inv;
    private final int primitive;

    private GaloisField(int q, int p, int[] add, int[] mul) {
        this.q = q;
        this.p = p;
        this.add = add;
        this.mul = mul;
        this.neg = new int[q];
        this.inv = new int[q];
        for (int a = 0; a < q; a++) {
            for (int b = 0; b < q; b++) {
                if (add[a * q + b] == 0) {
                    neg[a] = b;
                }
                if (mul[a * q + b] == 1) {
                    inv[a] = b;
                }
            }
        }
        this.primitive = findPrimitive();
    }

    /** Returns the prime p with q = p^e, or 0 when q is not a prime power (or q < 2). */
    static int characteristic(int q) {
        if (q < 2) {
            return 0;
        }
        int p = 2;
        while (q % p != 0) {
            p++;
        }
        int r = q;
        while (r % p == 0) {
            r /= p;
        }
        return r == 1 ? p : 0;
    }

    /** Builds GF(q); q must be a prime power. */
    static GaloisField of(int q) {
        int p = characteristic(q);
        if (p == 0) {
            throw new IllegalArgumentException(q + " is not a prime power; no field has " + q + " elements");
        }
        int e = 0;
        for (int r = q; r > 1; r /= p) {
            e++;
        }
        int[] add = new int[q * q];
        for (int a = 0; a < q; a++) {
            for (int b = 0; b < q; b++) {
                add[a * q + b] = digitwise(a, b, p, e);
            }
        }
        // Monic modulus x^e + low(x), low running over all q polynomials of degree < e.
        for (int low = 0; low < q; low++) {
            int[] mul = multiplicationTable(q, p, e, low);
            if (mul != null) {
                return new GaloisField(q, p, add, mul);
            }
        }
        throw new IllegalStateException("no irreducible polynomial of degree " + e + " over GF(" + p + ")");
    }

    private static int digitwise(int a, int b, int p, int e) {
        int r = 0;
        int place = 1;
        for (int i = 0; i < e; i++) {
            r += ((a % p + b % p) % p) * place;
            a /= p;
            b /= p;
            place *= p;
        }
        return r;
    }

    /** Returns the table mod x^e + low, or null when it has zero divisors. */
    private static int[] multiplicationTable(int q, int p, int e, int low) {
        int[] lowCoeff = coefficients(low, p, e);
        int[] mul = new int[q * q];
        for (int a = 0; a < q; a++) {
            int[] ca = coefficients(a, p, e);
            for (int b = 0; b < q; b++) {
                int[] cb = coefficients(b, p, e);
                int[] prod = new int[2 * e];
                for (int i = 0; i < e; i++) {
                    for (int j = 0; j < e; j++) {
                        prod[i + j] = (prod[i + j] + ca[i] * cb[j]) % p;
                    }
                }
                // x^e ≡ −low(x): fold high coefficients down, highest first.
                for (int d = 2 * e - 1; d >= e; d--) {
                    int c = prod[d];
                    if (c != 0) {
                        prod[d] = 0;
                        for (int i = 0; i < e; i++) {
                            prod[d - e + i] = ((prod[d - e + i] - c * lowCoeff[i]) % p + p) % p;
                        }
                    }
                }
                int v = 0;
                for (int i = e - 1; i >= 0; i--) {
                    v = v * p + prod[i];
                }
                if (v == 0 && a != 0 && b != 0) {
                    return null;
                }
                mul[a * q + b] = v;
            }
        }
        return mul;
    }

    private static int[] coefficients(int v, int p, int e) {
        int[] c = new int[e];
        for (int i = 0; i < e; i++) {
            c[i] = v % p;
            v /= p;
        }
        return c;
    }

    private int findPrimitive() {
        for (int g = 1; g < q; g++) {
            int order = 1;
            for (int x = g; x != 1; x = mul(x, g)) {
                order++;
            }
            if (order == q - 1) {
                return g;
            }
        }
        throw new IllegalStateException("GF(" + q + ") has no element of order " + (q - 1));
    }

    int size() {
        return q;
    }

    int characteristic() {
        return p;
    }

    int add(int a, int b) {
        return add[a * q + b];
    }

    int sub(int a, int b) {
        return add[a * q + neg[b]];
    }

    int mul(int a, int b) {
        return mul[a * q + b];
    }

    int neg(int a) {
        return neg[a];
    }

    /** Returns the inverse of a non-zero element. */
    int inv(int a) {
        if (a == 0) {
            throw new ArithmeticException("0 has no inverse");
        }
        return inv[a];
    }

    /** Returns an element of multiplicative order q−1. */
    int primitive() {
        return primitive;
    }
}
