/**
 * Exact fairness analysis of explicit dice sets, by counting rather than enumerating.
 *
 * <p>Promise: every number here is an exact integer. {@link
 * org.precedence.runtime.analysis.PatternTable} counts, for every ordered pattern of distinct
 * dice, how many outcomes rank those dice in that order — one pass over the word, never the
 * product of the side counts. {@link org.precedence.runtime.analysis.FairnessAnalysis} derives
 * order-, seat- and lead-fairness, subset depth and the worst deviation from those counts.
 */
package org.precedence.runtime.analysis;
