/**
 * The turn loop of Shoal Lights and the one place it meets the turn-order source.
 *
 * <p>{@link org.precedence.game.play.Match} plays rounds until the rules end the game. At the
 * start of every round it takes the live roster (the seats still in, in seat order), calls
 * {@link org.precedence.api.TurnOrderSource#roll(long, int)} exactly once with the roster's
 * size, and maps the result's order back to seats: that call replaces a shuffle. It tells a
 * {@link org.precedence.game.play.TableListener} about each round's rolls before anyone
 * moves, asks each seat's {@link org.precedence.game.play.MoveChooser} for a move, and
 * returns the whole game as a {@link org.precedence.game.log.GameRecord}.
 *
 * <p>Promise: the loop itself draws no randomness and reads no clock; given the same setup,
 * the same source and the same moves it produces the same record.
 */
package org.precedence.game.play;
