/**
 * The terminal side of Shoal Lights: the only package that reads or writes text.
 *
 * <p>{@link org.precedence.game.terminal.TableRenderer} prints the table as the game goes:
 * each round's die rolls (die, face value, place in the order) before anyone moves, the moves,
 * the board, and the result. {@link org.precedence.game.terminal.HotSeat} lets people share one
 * terminal: it prompts the seat to move, reads a line, and re-prompts with a one-line reason
 * for anything malformed or illegal, leaving the game as it was.
 */
package org.precedence.game.terminal;
