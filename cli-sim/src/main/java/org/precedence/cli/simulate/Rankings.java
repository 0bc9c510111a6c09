package org.precedence.cli.simulate;

import org.precedence.runtime.dice.DieNames;

/**
 * Cheap counting of whole rankings for up to {@value #MAX_COUNTED} players. A ranking is packed
 * as the base-n number its player indices spell ({@code n^n ≤ 46,656} cells), which costs a
 * multiply-add per player in the hot loop; only the n! cells that are permutations can be hit.
 * {@link #lexicographic} lists those rankings in lexicographic order for reporting.
 */
final class Rankings {
    /** Largest player count whose rankings are counted one by one (6! = 720). */
    static final int MAX_COUNTED = 6;

    private Rankings() {
    }

    /** Returns whether rankings of {@code players} players are counted individually. */
    static boolean counted(int players) {
        return players <= MAX_COUNTED;
    }

    /** Returns the number of packed cells, {@code players^players}. */
    static int cells(int players) {
        int c = 1;
        for (int i = 0; i < players; i++) {
            c *= players;
        }
        return c;
    }

    /** Returns the packed cell of {@code order[0..players)}. */
    static int pack(int[] order, int players) {
        int idx = 0;
        for (int p = 0; p < players; p++) {
            idx = idx * players + order[p];
        }
        return idx;
    }

    /** Returns {@code players!} as a long. */
    static long factorial(int players) {
        long f = 1;
        for (int i = 2; i <= players; i++) {
            f *= i;
        }
        return f;
    }

    /** Returns every ranking of {@code players} players in lexicographic order. */
    static int[][] lexicographic(int players) {
        int[][] all = new int[(int) factorial(players)][];
        int[] a = new int[players];
        for (int i = 0; i < players; i++) {
            a[i] = i;
        }
        for (int k = 0; k < all.length; k++) {
            all[k] = a.clone();
            nextPermutation(a);
        }
        return all;
    }

    /** Returns the name of a ranking: die (player) letters in acting order, e.g. "BACD". */
    static String name(int[] ranking) {
        return DieNames.ranking(ranking);
    }

    /** Steps to the next permutation in lexicographic order (Knuth, TAOCP 7.2.1.2, Algorithm L). */
    private static void nextPermutation(int[] a) {
        int j = a.length - 2;
        while (j >= 0 && a[j] >= a[j + 1]) {
            j--;
        }
        if (j < 0) {
            return;
        }
        int l = a.length - 1;
        while (a[l] <= a[j]) {
            l--;
        }
        swap(a, j, l);
        for (int i = j + 1, k = a.length - 1; i < k; i++, k--) {
            swap(a, i, k);
        }
    }

    private static void swap(int[] a, int i, int j) {
        int t = a[i];
        a[i] = a[j];
        a[j] = t;
    }
}
