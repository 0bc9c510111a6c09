/**
 * The {@code precedence} command. {@link org.precedence.cli.PrecedenceApplication} wires one
 * picocli command class per verb; {@link org.precedence.cli.ErrorMapper} is the single place
 * that turns bad input into a one-line message and exit code 2.
 *
 * <p>Exit codes, for every verb: 0 ok, 1 a check failed (e.g. the set is not order-fair),
 * 2 bad input. All output goes through picocli's writers so tests can capture it.
 */
package org.precedence.cli;
