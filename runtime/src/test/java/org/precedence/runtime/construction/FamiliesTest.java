package org.precedence.runtime.construction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.List;
import org.junit.jupiter.api.Test;

class FamiliesTest {

    /** The fast preimage of every family inverts its member(): σ(preimage(i, y)) = y. */
    @Test
    void preimage_invertsMember() {
        java.util.SplittableRandom random = new java.util.SplittableRandom(90210L); // fixed seed: indices only
        List<PermutationFamily> families = List.of(Families.symmetric(3), Families.symmetric(10),
                Families.symmetric(12), Families.symmetric(20), Families.symmetric(21), Families.alternating(4),
                Families.alternating(10), Families.alternating(12), Families.alternating(20),
                Families.projective(4), Families.projective(9), Families.projective(11), Families.affine(8),
                Families.mathieu11());
        for (PermutationFamily f : families) {
            int n = f.points();
            BigInteger order = f.order();
            int[] scratch = new int[n];
            for (int trial = 0; trial < 200; trial++) {
                long index = trial == 0 ? 0 : trial == 1 ? order.subtract(BigInteger.ONE).min(
                        BigInteger.valueOf(Long.MAX_VALUE)).longValueExact()
                        : random.nextLong(order.min(BigInteger.valueOf(Long.MAX_VALUE)).longValueExact());
                int[] sigma = f.member(BigInteger.valueOf(index));
                for (int x = 0; x < n; x++) {
                    assertEquals(x, f.preimage(index, sigma[x], scratch), f.name() + " member " + index);
                }
            }
        }
        assertThrows(IndexOutOfBoundsException.class, () -> Families.alternating(10).preimage(1814400L, 0, new int[10]));
        assertThrows(IndexOutOfBoundsException.class, () -> Families.symmetric(10).preimage(3628800L, 0, new int[10]));
        assertThrows(IndexOutOfBoundsException.class, () -> Families.projective(9).preimage(720L, 0, new int[10]));
    }


    @Test
    void mathieu12_orderAndFiveTransitivityProven() {
        // |M12| = 95040, sharply 5-transitive on 12 points: ATLAS of Finite Group Representations.
        FamilyProof proof = Families.proofOf(Families.mathieu12());
        assertEquals(BigInteger.valueOf(95040), proof.order());
        assertEquals(12, proof.points());
        assertEquals(5, proof.uniformTuples());
    }

    @Test
    void mathieu11_orderAndFourTransitivityProven() {
        // |M11| = 7920, sharply 4-transitive on 11 points: ATLAS of Finite Group Representations.
        FamilyProof proof = Families.proofOf(Families.mathieu11());
        assertEquals(BigInteger.valueOf(7920), proof.order());
        assertEquals(11, proof.points());
        assertEquals(4, proof.uniformTuples());
    }

    @Test
    void mathieu_imagesOfSampledTuplesCoverEveryTupleOnce() {
        // Independent of the proof's argument: for sampled source tuples u, the images of u
        // under all members must be every ordered tuple exactly once.
        assertImagesCoverOnce(Families.mathieu11(), 4, 60);
        assertImagesCoverOnce(Families.mathieu12(), 5, 12);
    }

    static void assertImagesCoverOnce(PermutationFamily family, int k, int samples) {
        int n = family.points();
        int tuples = Lehmer.falling(n, k).intValueExact();
        int members = family.order().intValueExact();
        int[][] all = new int[members][];
        for (int i = 0; i < members; i++) {
            all[i] = family.member(BigInteger.valueOf(i));
        }
        java.util.SplittableRandom random = new java.util.SplittableRandom(7);
        int[] u = new int[k];
        int[] w = new int[k];
        for (int s = 0; s < samples; s++) {
            FamilySamples.tupleOf(random.nextInt(tuples), k, n, u);
            boolean[] hit = new boolean[tuples];
            for (int[] p : all) {
                for (int j = 0; j < k; j++) {
                    w[j] = p[u[j]];
                }
                int r = FamilySamples.tupleRank(w, k, n);
                assertTrue(!hit[r], family.name() + " maps a tuple onto another twice");
                hit[r] = true;
            }
        }
    }

    @Test
    void hexads_formSteinerSystem() {
        boolean[] hexads = MathieuGroups.hexads();
        int count = 0;
        for (boolean h : hexads) {
            count += h ? 1 : 0;
        }
        // S(5,6,12) has C(12,5)/C(6,5) = 792/6 = 132 blocks (standard design theory).
        assertEquals(132, count);
    }

    @Test
    void affine_orderIsQTimesQMinusOneForEveryPrimePower() {
        // |AGL(1,q)| = q(q−1): standard group theory.
        for (int q = 2; q <= 64; q++) {
            if (Families.isPrimePower(q)) {
                FamilyProof proof = Families.proofOf(Families.affine(q));
                assertEquals(BigInteger.valueOf((long) q * (q - 1)), proof.order(), "q=" + q);
                assertEquals(2, proof.uniformTuples());
            }
        }
    }

    @Test
    void projective_orderIsQPlusOneTimesQTimesQMinusOne() {
        // |PGL(2,q)| = (q+1)q(q−1): standard group theory. The exhaustive proof for the largest q
        // runs in the served-set tests; here the q that small player counts use.
        for (int q : new int[] {2, 3, 4, 5, 7, 8, 9, 11, 13, 16, 17, 19, 23}) {
            FamilyProof proof = Families.proofOf(Families.projective(q));
            assertEquals(BigInteger.valueOf((long) (q + 1) * q * (q - 1)), proof.order(), "q=" + q);
            assertEquals(3, proof.uniformTuples());
        }
    }

    @Test
    void smallFamilies_uniformByDirectCount() {
        assertUniformByDirectCount(Families.affine(8), 2);
        assertUniformByDirectCount(Families.affine(9), 2);
        assertUniformByDirectCount(Families.projective(5), 3);
        assertUniformByDirectCount(Families.projective(7), 3);
        assertUniformByDirectCount(Families.alternating(5), 3);
        assertUniformByDirectCount(Families.alternating(6), 4);
        assertUniformByDirectCount(Families.symmetric(5), 5);
    }

    @Test
    void symmetricAndAlternating_provenForEveryPlayerCount() {
        for (int n = 2; n <= 64; n++) {
            FamilyProof s = Families.proofOf(Families.symmetric(n));
            assertEquals(Families.factorial(n), s.order());
            assertEquals(n, s.uniformTuples());
            if (n >= 4) {
                FamilyProof a = Families.proofOf(Families.alternating(n));
                assertEquals(Families.factorial(n).shiftRight(1), a.order());
                assertEquals(n - 2, a.uniformTuples());
            }
        }
    }

    @Test
    void alternating_membersAreEvenAndDistinct() {
        PermutationFamily a7 = Families.alternating(7);
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (int i = 0; i < 2520; i++) {
            int[] p = a7.member(BigInteger.valueOf(i));
            assertEquals(0, FamilySamples.parity(p));
            assertTrue(seen.add(java.util.Arrays.toString(p)));
        }
    }

    @Test
    void smallestUniform_picksTheSmallGroups() {
        assertEquals("PGL(2,5)", Families.smallestUniform(6, 3).name());
        assertEquals("A6", Families.smallestUniform(6, 4).name());
        assertEquals("S6", Families.smallestUniform(6, 5).name());
        assertEquals("M11", Families.smallestUniform(11, 4).name());
        assertEquals("M12", Families.smallestUniform(12, 5).name());
        assertEquals("PGL(2,11)", Families.smallestUniform(12, 3).name());
        assertEquals("AGL(1,7)", Families.smallestUniform(7, 2).name());
    }

    @Test
    void sharplyTransitiveCheck_rejectsAFamilyThatIsNotUniform() {
        // The cyclic shifts of 5 points pass as a family indexed by the image of 0, but they
        // are not uniform on ordered pairs; the check must say so.
        PermutationFamily cyclic = new PermutationFamily() {
            @Override public String name() {
                return "C5";
            }
            @Override public int points() {
                return 5;
            }
            @Override public BigInteger order() {
                return BigInteger.valueOf(20);
            }
            @Override public int uniformTuples() {
                return 2;
            }
            @Override public void member(BigInteger index, int[] out) {
                int shift = index.intValueExact() % 5;
                for (int x = 0; x < 5; x++) {
                    out[x] = (x + shift) % 5;
                }
            }
            @Override public FamilyProof prove() {
                int[] g = new int[] {1, 2, 3, 4, 0};
                return new FamilyProof(name(), 5, order(), 2, SharplyTransitiveCheck.prove(this, 2, List.of(g)));
            }
        };
        assertThrows(IllegalStateException.class, cyclic::prove);
    }

    @Test
    void galoisField_axiomsHoldExhaustively() {
        for (int q : new int[] {2, 3, 4, 8, 9, 16, 25, 27}) {
            GaloisField f = GaloisField.of(q);
            for (int a = 0; a < q; a++) {
                for (int b = 0; b < q; b++) {
                    assertEquals(f.mul(a, b), f.mul(b, a));
                    for (int c = 0; c < q; c++) {
                        assertEquals(f.mul(a, f.add(b, c)), f.add(f.mul(a, b), f.mul(a, c)));
                        assertEquals(f.mul(f.mul(a, b), c), f.mul(a, f.mul(b, c)));
                    }
                }
                if (a != 0) {
                    assertEquals(1, f.mul(a, f.inv(a)));
                }
            }
        }
        assertThrows(IllegalArgumentException.class, () -> GaloisField.of(6));
    }

    /** Counts σ(u) over all members and all ordered k-tuples u; every (u, w) must get |F|/(n)_k. */
    static void assertUniformByDirectCount(PermutationFamily family, int k) {
        int n = family.points();
        int tuples = Lehmer.falling(n, k).intValueExact();
        int members = family.order().intValueExact();
        int expected = members / tuples;
        int[] hits = new int[tuples * tuples];
        int[][] all = new int[tuples][k];
        for (int r = 0; r < tuples; r++) {
            FamilySamples.tupleOf(r, k, n, all[r]);
        }
        int[] w = new int[k];
        int[] p = new int[n];
        for (int i = 0; i < members; i++) {
            family.member(BigInteger.valueOf(i), p);
            for (int r = 0; r < tuples; r++) {
                int[] u = all[r];
                for (int j = 0; j < k; j++) {
                    w[j] = p[u[j]];
                }
                hits[r * tuples + FamilySamples.tupleRank(w, k, n)]++;
            }
        }
        for (int h : hits) {
            assertEquals(expected, h, family.name());
        }
    }
}
