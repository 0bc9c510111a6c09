/**
 * Counter-based randomness for rolls: every 64-bit word is a pure function of (session seed,
 * draw index, stream, player, digit, attempt), so any round is computed directly, at the same
 * cost, identically on every thread and in every evaluation order.
 *
 * <p>{@link org.precedence.runtime.randomness.RollGenerator} turns a counter into four words
 * (fast mode: Philox4x64-10 from Apache Commons RNG; secure mode: HMAC-SHA256 from the JDK);
 * {@link org.precedence.runtime.randomness.BoundedSampler} turns words into exactly uniform
 * digits by rejection (in fast mode, {@code precedence-roll-v3/philox4x64}, radices below 2^16
 * take 16-bit chunks, so one block serves four rounds of four players, and the leading digits
 * of a multi-digit face are drawn together as one {@link
 * org.precedence.runtime.randomness.LeadingGroup leading key} from a 32-bit chunk, eight dice per
 * block; the retired {@code precedence-roll-v2/philox4x64} (digit by digit) and {@code
 * precedence-roll-v1/philox4x64} (one 64-bit word per draw) are still implemented for replay);
 * {@link org.precedence.runtime.randomness.SeededFaces} memoises each
 * player's digits so that {@link org.precedence.runtime.dice.MixedRadixDice#compare} can pull
 * them lazily. The exact layouts are written down in {@code docs/roll-spec.md}; the committed
 * golden vectors pin them, and they never change without a new algorithm id.
 */
package org.precedence.runtime.randomness;
