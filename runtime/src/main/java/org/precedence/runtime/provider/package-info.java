/**
 * The turn-order provider engines discover with {@link java.util.ServiceLoader}: {@link
 * org.precedence.runtime.provider.FairDiceProvider} opens {@link
 * org.precedence.runtime.provider.DiceSession}s, which roll order-fair dice served by a {@link
 * org.precedence.runtime.source.SetSource} with counter-based randomness, and turn the rolls
 * into turn orders by the session's {@link org.precedence.api.OrderRule}.
 *
 * <p>The default sets are {@link org.precedence.runtime.source.SetSources#standard()}, with every
 * set of at most 65,536 faces rolled as its explicit list of faces (id suffix {@code /listed}).
 *
 * <p>Sessions roll with the current algorithm of their mode ({@code precedence-roll-v3/philox4x64}
 * fast, {@code precedence-roll-v1/hmac-sha256} secure; see {@code docs/roll-spec.md});
 * {@link org.precedence.runtime.provider.DiceSession#open(org.precedence.api.SessionSpec,
 * org.precedence.runtime.source.SetSource, String)} opens one with an earlier algorithm id, to
 * replay its logs.
 *
 * <p>Promises: every round is a pure function of (spec, round, player count); a round with n
 * players rolls the served order-fair set for n, whatever was played before (players may join
 * or leave between rounds); {@link org.precedence.runtime.provider.FastOrders} gives the same
 * orders as the sessions at simulation speed (allocation-free for explicit sets walked in
 * round order). Constructed sets are ranked by their prefix keys on both paths, and their exact
 * faces computed on long digits; the lazy digit-by-digit comparison serves every other set and
 * is the reference both are tested against.
 */
package org.precedence.runtime.provider;
