package org.precedence.runtime.search;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.analysis.FairnessReport;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.dice.Word;

/**
 * Exhaustive search for dice sets of given side counts whose every {@code depth}-subset is
 * order-fair (with depth = number of dice: order-fair sets).
 *
 * <p>The search grows sets die by die ({@link DieInsertion}): the solutions on the first k
 * dice, extended by every admissible placement of die k+1. To avoid repeating work, the
 * solutions at each level are reduced to one representative per class under the symmetry
 * group of that level (renaming dice of equal side count, reversing the word) — a group that
 * also acts on all longer solutions and commutes with dropping the last die. Hence every
 * class of full solutions contains a member grown from a representative, and the labelled
 * count is {@code Σ_rep |class of rep| · (extensions of rep)}.
 *
 * <p>Levels up to {@code n-1} are expanded breadth-first with exact deduplication; with a
 * stop-after request, the search instead goes depth-first from the two-dice representatives,
 * which reaches first solutions far sooner on large sizes. Both cover the whole space.
 *
 * <p>Every class representative returned is re-verified with {@link FairnessAnalysis}.
 */
public final class FairSetSearch {
    /** At most this many class representatives are returned (the least ones); counts stay exact. */
    public static final int MAX_WORDS = 10_000;
    private static final long PROGRESS_FIRST_MS = 3000;
    private static final long PROGRESS_EVERY_MS = 5000;

    private FairSetSearch() {
    }

    /** Runs the search. Never throws for a valid request; see {@link SearchResult}. */
    public static SearchResult run(SearchRequest request) {
        long start = System.nanoTime();
        int[] sides = request.sides();
        int depth = request.depth();
        Optional<String> violation = SideBounds.violation(sides, depth);
        if (violation.isPresent()) {
            return new SearchResult(sides, depth, true, BigInteger.ZERO, 0, List.of(),
                    violation.get(), millisSince(start), 0);
        }
        long deadline = request.timeLimit() == null ? Long.MAX_VALUE
                : start + request.timeLimit().toNanos();
        SearchControl control = new SearchControl(deadline);
        Run run = new Run(request, control, start);
        ExecutorService pool = Executors.newFixedThreadPool(request.threads(), daemons("search"));
        ScheduledExecutorService ticker = request.progress() == null ? null
                : Executors.newSingleThreadScheduledExecutor(daemons("search-progress"));
        try {
            if (ticker != null) {
                ticker.scheduleAtFixedRate(() -> request.progress().accept(run.status()),
                        PROGRESS_FIRST_MS, PROGRESS_EVERY_MS, TimeUnit.MILLISECONDS);
            }
            run.execute(pool);
        } finally {
            pool.shutdownNow();
            if (ticker != null) {
                ticker.shutdownNow();
            }
        }
        List<Word> words = run.finalWords();
        for (Word w : words) {
            verify(w, depth);
        }
        boolean complete = !control.stopped();
        return new SearchResult(sides, depth, complete, complete ? run.labelled() : BigInteger.ZERO,
                words.size(), words, complete ? null : control.stopReason(), millisSince(start),
                control.nodes.sum());
    }

    private static void verify(Word w, int depth) {
        FairnessReport report = FairnessAnalysis.analyse(w, RankingConvention.LOWEST_FIRST);
        if (report.subsetDepth() < depth) {
            throw new IllegalStateException("search produced " + w + " with subset depth "
                    + report.subsetDepth() + " < " + depth);
        }
    }

    private static long millisSince(long start) {
        return (System.nanoTime() - start) / 1_000_000;
    }

    private static ThreadFactory daemons(String name) {
        AtomicInteger counter = new AtomicInteger();
        return r -> {
            Thread t = new Thread(r, name + "-" + counter.incrementAndGet());
            t.setDaemon(true);
            return t;
        };
    }

    /** A representative word and the size of its class. */
    private record Rep(byte[] word, long orbit) {
    }

    /** Byte-array key with value semantics. */
    private record Key(byte[] word) {
        @Override
        public boolean equals(Object o) {
            return o instanceof Key k && Arrays.equals(k.word, word);
        }

        @Override
        public int hashCode() {
            return Arrays.hashCode(word);
        }
    }

    /** State of one run. */
    private static final class Run {
        private final SearchRequest request;
        private final SearchControl control;
        private final long start;
        private final int n;
        private final int[] sides;
        private final DieInsertion[] insertions;
        private final SymmetryGroup[] groups;
        private final ConcurrentHashMap<Key, Boolean> finals = new ConcurrentHashMap<>();
        private final AtomicLong tasksDone = new AtomicLong();
        private volatile long tasksTotal;
        private volatile String stage = "starting";
        private BigInteger labelled = BigInteger.ZERO;

        Run(SearchRequest request, SearchControl control, long start) {
            this.request = request;
            this.control = control;
            this.start = start;
            this.sides = request.sides();
            this.n = sides.length;
            this.insertions = new DieInsertion[n];
            this.groups = new SymmetryGroup[n + 1];
            for (int k = 1; k <= n; k++) {
                groups[k] = new SymmetryGroup(Arrays.copyOf(sides, k));
            }
            for (int k = 1; k < n; k++) {
                insertions[k] = new DieInsertion(Arrays.copyOf(sides, k + 1), request.depth());
            }
        }

        String status() {
            return String.format("search %s: %s, %d/%d tasks, %d classes found, %.1f s",
                    Arrays.toString(sides), stage, tasksDone.get(), tasksTotal, finals.size(),
                    (System.nanoTime() - start) / 1e9);
        }

        void execute(ExecutorService pool) {
            List<Rep> reps = List.of(new Rep(new byte[sides[0]], 1));
            int breadthLevels = request.stopAfter() > 0 ? Math.min(2, n - 1) : n - 1;
            for (int k = 1; k < breadthLevels && !control.stopped(); k++) {
                reps = expandLevel(pool, reps, k);
            }
            if (request.stopAfter() > 0) {
                // Looking for some solutions, not all: well-mixed words first. Solutions have
                // every pair of dice interleaved evenly, so their restrictions are well mixed.
                List<Rep> ordered = new ArrayList<>(reps);
                ordered.sort(Comparator.comparingLong((Rep r) -> spread(r.word()))
                        .thenComparing(Rep::word, Arrays::compare));
                reps = ordered;
            }
            if (!control.stopped()) {
                finishDepthFirst(pool, reps, breadthLevels);
            }
        }

        /** How far the word's letters stray from an even spread: the largest prefix deviation. */
        static long spread(byte[] word) {
            int letters = 0;
            for (byte b : word) {
                letters = Math.max(letters, b + 1);
            }
            long[] total = new long[letters];
            for (byte b : word) {
                total[b]++;
            }
            long[] seen = new long[letters];
            long worst = 0;
            for (int i = 0; i < word.length; i++) {
                seen[word[i]]++;
                for (int x = 0; x < letters; x++) {
                    worst = Math.max(worst, Math.abs(seen[x] * word.length - total[x] * (i + 1)));
                }
            }
            return worst;
        }

        /** Expands every representative on k dice into the representatives on k+1 dice. */
        private List<Rep> expandLevel(ExecutorService pool, List<Rep> reps, int k) {
            stage = "level " + (k + 1) + " of " + n + " (breadth-first)";
            ConcurrentHashMap<Key, Boolean> next = new ConcurrentHashMap<>();
            SymmetryGroup group = groups[k + 1];
            List<Future<?>> futures = new ArrayList<>();
            tasksDone.set(0);
            tasksTotal = reps.size();
            for (Rep rep : reps) {
                futures.add(pool.submit(() -> {
                    insertions[k].extend(rep.word(),
                            w -> next.putIfAbsent(new Key(group.canonical(w)), Boolean.TRUE),
                            control);
                    tasksDone.incrementAndGet();
                }));
            }
            await(futures);
            List<Rep> out = new ArrayList<>(next.size());
            for (Key key : next.keySet()) {
                out.add(new Rep(key.word(), group.orbitSize(key.word())));
            }
            out.sort(Comparator.comparing(Rep::word, Arrays::compare));
            return out;
        }

        /** Grows every representative on {@code level} dice to full solutions, depth-first. */
        private void finishDepthFirst(ExecutorService pool, List<Rep> reps, int level) {
            stage = "levels " + (level + 1) + ".." + n + " (depth-first)";
            List<Future<BigInteger>> futures = new ArrayList<>();
            tasksDone.set(0);
            tasksTotal = reps.size();
            for (Rep rep : reps) {
                futures.add(pool.submit(() -> {
                    long leaves = grow(rep.word(), level);
                    tasksDone.incrementAndGet();
                    return BigInteger.valueOf(leaves).multiply(BigInteger.valueOf(rep.orbit()));
                }));
            }
            BigInteger total = BigInteger.ZERO;
            for (Future<BigInteger> f : futures) {
                total = total.add(get(f));
            }
            labelled = total;
        }

        /** Returns the number of full solutions restricting to {@code word} on {@code level} dice. */
        private long grow(byte[] word, int level) {
            if (level == n) {
                byte[] canonical = groups[n].canonical(word);
                finals.putIfAbsent(new Key(canonical), Boolean.TRUE);
                if (request.stopAfter() > 0 && finals.size() >= request.stopAfter()) {
                    control.stop("stopped after " + request.stopAfter() + " classes");
                }
                return 1;
            }
            long[] leaves = new long[1];
            insertions[level].extend(word, w -> leaves[0] += grow(w, level + 1), control);
            return leaves[0];
        }

        BigInteger labelled() {
            return labelled;
        }

        List<Word> finalWords() {
            List<byte[]> raw = new ArrayList<>();
            for (Key k : finals.keySet()) {
                raw.add(k.word());
            }
            raw.sort(Arrays::compare);
            List<Word> out = new ArrayList<>(Math.min(raw.size(), MAX_WORDS));
            for (byte[] w : raw.subList(0, Math.min(raw.size(), MAX_WORDS))) {
                int[] letters = new int[w.length];
                for (int i = 0; i < w.length; i++) {
                    letters[i] = w[i];
                }
                out.add(Word.of(n, letters));
            }
            return out;
        }

        private static void await(List<Future<?>> futures) {
            for (Future<?> f : futures) {
                get(f);
            }
        }

        private static <T> T get(Future<T> f) {
            try {
                return f.get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("search interrupted", e);
            } catch (ExecutionException e) {
                Throwable cause = e.getCause();
                if (cause instanceof RuntimeException re) {
                    throw re;
                }
                if (cause instanceof Error err) {
                    throw err;
                }
                throw new IllegalStateException(cause);
            }
        }
    }
}
