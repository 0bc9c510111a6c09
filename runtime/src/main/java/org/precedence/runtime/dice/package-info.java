/**
 * The dice-set model: explicit sets of dice with distinct face values ({@link
 * org.precedence.runtime.dice.DiceSet}), their words ({@link org.precedence.runtime.dice.Word}),
 * canonical form and hash, and {@link org.precedence.runtime.dice.MixedRadixDice}, the one view
 * through which both explicit and constructed (implicit, astronomically large) sets are rolled.
 *
 * <p>Promise: a {@code DiceSet} that exists is valid (at least two dice, no empty die, all
 * values distinct across the set); invalid input is rejected with a {@link
 * org.precedence.runtime.dice.InvalidDiceSetException} that says what is wrong and where.
 */
package org.precedence.runtime.dice;
