/**
 * Exact fairness analysis of explicit dice sets, by counting rather than enumerating.
 *
 * <p>Promise: every number here is an exact integer (or an exact fraction). {@link
 * org.precedence.runtime.analysis.PatternTable} counts, for every ordered pattern of distinct
 * dice, how many outcomes rank those dice in that order — one pass over the word, never the
 * product of the side counts. {@link org.precedence.runtime.analysis.FairnessAnalysis} derives
 * order-, seat- and lead-fairness, subset depth and the worst deviation from those counts.
 * {@link org.precedence.runtime.analysis.LowerBounds} gives the divisibility conditions every
 * order-fair set meets, and {@link org.precedence.runtime.analysis.RerollExpectation} the cost
 * of the ordinary alternative (re-rolling ties), as a reduced fraction.
 */
package org.precedence.runtime.analysis;
