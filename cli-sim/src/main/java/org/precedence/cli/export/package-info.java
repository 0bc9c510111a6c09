/**
 * {@code precedence export}: the served order-fair set for n players in forms for making
 * physical dice — a CSV face list, a Markdown sheet, and an SVG sheet of face labels to stick
 * on blank dice.
 *
 * <p>Promise: what is exported is exactly the set the provider serves (values renumbered
 * 1..total faces, the same numbers the provider reports); sets whose faces cannot be listed
 * (constructed sets, astronomically many faces) are refused with a clear message and exit
 * code 2, never truncated silently. Files are written atomically.
 */
package org.precedence.cli.export;
