/**
 * Order-fair dice for any number of players, built in layers and never written out.
 *
 * <p>Promise: a {@link org.precedence.runtime.construction.Construction} that exists reaches
 * subset depth n by levels each lifting the depth by one, and every family it uses has passed
 * its exhaustive (or, for S_n and A_n beyond 8 points, structural) proof of uniformity on
 * ordered tuples ({@link org.precedence.runtime.construction.FamilyProof}). {@link
 * org.precedence.runtime.construction.ConstructedDice} rolls such a set through the mixed-radix
 * view in memory independent of its side count; {@link
 * org.precedence.runtime.construction.ComposedCounts} recomputes the exact ranking counts of
 * the whole word for small n by composing pattern counts block by block, without ever
 * materialising it.
 */
package org.precedence.runtime.construction;
