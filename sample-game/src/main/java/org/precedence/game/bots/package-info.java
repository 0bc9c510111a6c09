/**
 * Bots that can play any seat of Shoal Lights.
 *
 * <p>Promise: a bot's move is a pure function of (bot seed, round, seat, position). It keeps
 * no state between moves, so a game with only bots is reproducible from its seed alone, and a
 * replay can ask a bot again and get the same answer.
 */
package org.precedence.game.bots;
