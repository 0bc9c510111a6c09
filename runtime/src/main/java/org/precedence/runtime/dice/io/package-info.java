/**
 * Reading and writing dice sets: a JSON form ({@code {"dice": [[1, 8, 11], …]}}, optionally
 * with die names) and a plain text form of our own (one die per line). See {@code
 * docs/analysis.md} for both grammars.
 *
 * <p>Promise: {@link org.precedence.runtime.dice.io.DiceSetReader} either returns a valid
 * {@link org.precedence.runtime.dice.DiceSet} or throws a {@link
 * org.precedence.runtime.dice.io.SetFormatException} whose one-line message starts with the
 * line and column of the problem and says what is allowed. {@link
 * org.precedence.runtime.dice.io.DiceSetWriter} writes what the reader reads back to an equal
 * set, and writes files atomically (never a half-written file).
 */
package org.precedence.runtime.dice.io;
