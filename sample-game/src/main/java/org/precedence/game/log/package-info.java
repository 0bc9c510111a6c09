/**
 * The record of a game of Shoal Lights and its file.
 *
 * <p>A {@link org.precedence.game.log.GameRecord} holds the setup (seed, mode, seats), every
 * round's roster, dice rolls, order and moves, and the result. {@link
 * org.precedence.game.log.GameLogFile} writes it as JSON (Gson) atomically — temporary file in
 * the same directory, flushed to disk, then renamed over the target — so a log on disk is
 * always whole; and reads it back with a one-line error for anything that is not a valid log.
 *
 * <p>The log reveals the session seed: it is meant to be published after the game, so that
 * anyone can re-run every round (see {@code org.precedence.game.replay}).
 */
package org.precedence.game.log;
