/**
 * The rules of Shoal Lights, free of input, output and randomness.
 *
 * <p>The board ({@link org.precedence.game.rules.Board}) is a ring: Lowmarket Harbour and
 * eleven islands, each with a lantern worth 1 to 3 glow. Every boat starts in the harbour with
 * 2 oil. On its turn a boat makes exactly one {@link org.precedence.game.rules.Move}: sail 1 to
 * 3 places clockwise, light the dark lantern where it lies (1 oil, scores the glow), gather oil
 * (+1, at most 3) or retire (its lanterns go dark). Who acts first matters: two boats at the
 * same dark island race for it.
 *
 * <p>Promise: {@link org.precedence.game.rules.GameState} is immutable; {@link
 * org.precedence.game.rules.Rules#apply} either returns the next state or throws {@link
 * org.precedence.game.rules.IllegalMoveException} with a one-line reason, so a refused move
 * leaves the game exactly as it was. {@link org.precedence.game.rules.Rules#outcome} always
 * names exactly one winner.
 */
package org.precedence.game.rules;
