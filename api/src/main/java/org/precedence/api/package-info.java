/**
 * What a game engine codes against: a {@link org.precedence.api.TurnOrderSource} that replaces
 * a shuffle, the values it returns, and the {@link org.precedence.api.TurnOrderProvider}
 * service interface through which an engine finds the implementation with
 * {@link java.util.ServiceLoader}, without naming any runtime class.
 *
 * <p>The package has no dependencies beyond the JDK. All values are immutable and reject
 * {@code null} arguments with a {@link NullPointerException} naming the argument.
 */
package org.precedence.api;
