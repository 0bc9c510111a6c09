/**
 * Shoal Lights, a small complete board game that shows an engine developer how a
 * {@link org.precedence.api.TurnOrderSource} drops into a real turn loop.
 *
 * <p>Two to eight lantern boats leave Lowmarket Harbour to light the lanterns of the Veyra
 * Shoals, a ring of eleven islands. Every round the turn order comes from the provider, found
 * with {@link org.precedence.api.TurnOrderProvider#load()}, in place of a shuffle. The game
 * compiles against {@code org.precedence.api} only.
 *
 * <p>Packages, each with one job: {@code rules} (board, state, moves, legality, winner),
 * {@code bots} (seeded, deterministic seat players), {@code play} (the turn loop and the one
 * call per round to the turn-order source), {@code log} (the JSON record of a game, atomic
 * save, replay check) and {@code terminal} (the table renderer and the hot-seat prompt). Only
 * {@code terminal} does input or output.
 *
 * <p>{@link org.precedence.game.GameSetup} fixes everything a game needs besides the moves.
 */
package org.precedence.game;
