/**
 * Re-runs a logged game and confirms it.
 *
 * <p>{@link org.precedence.game.replay.Replay#check} rebuilds the table from the log, opens the
 * same session with the provider, and plays the game again with the logged moves. It confirms,
 * round by round, the roster, every die roll, the order and the moves (for bot seats it also
 * asks the bot again and expects the logged move), then the departures and the result. The
 * first difference is reported with its round; nothing else is trusted from the log.
 */
package org.precedence.game.replay;
