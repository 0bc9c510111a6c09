/**
 * Where served sets come from: {@link org.precedence.runtime.source.SetSource} answers "which
 * order-fair dice do n players roll?" — the shipped catalog first, the implicit construction
 * for every other n — and caches the answer per player count and grade.
 *
 * <p>Promise: {@link org.precedence.runtime.source.SetSources#standard()} serves 2 to 64
 * players, builds each (players, grade) at most once per source even under concurrent first
 * requests, keeps a bounded number of sets, and only serves sets whose grade has been proven
 * (catalog entries by their own exact check; constructions by family proofs that the test suite
 * runs for every player count and {@code ConstructedDice.proofs()} re-runs on demand, and —
 * for levels fitted to one word — by exact counts recomposed before the set is served). Bad input
 * is an {@link java.lang.IllegalArgumentException} naming the supported range.
 */
package org.precedence.runtime.source;
