/**
 * Search for order-fair dice sets (and sets of a given subset depth).
 *
 * <p>Promise: {@link org.precedence.runtime.search.FairSetSearch} is exhaustive — when its
 * result says {@code complete}, the labelled count and the class count (up to renaming dice
 * of equal side count and reversing the word) are exact, and zero means no such set exists.
 * Requests that fail the divisibility bound on any subset are answered at once by {@link
 * org.precedence.runtime.search.SideBounds}. {@link org.precedence.runtime.search.StructuredSearch}
 * reaches sizes beyond exhaustive reach by joining renamed copies and adding dice; it finds
 * some sets, not all. Every word either class returns has been re-checked with the exact
 * analysis in {@code org.precedence.runtime.analysis}.
 */
package org.precedence.runtime.search;
