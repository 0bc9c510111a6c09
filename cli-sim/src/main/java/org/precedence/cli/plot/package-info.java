/**
 * Pictures of a simulation for people who never met a p-value: an SVG with, per player count,
 * a bar chart of how often each turn order came up (with the level fair dice aim at and the
 * band chance keeps 95 % of bars in) and a heat map of who acted in which position.
 *
 * <p>Promise: {@link org.precedence.cli.plot.SimulationPlot#svg} returns a well-formed,
 * standalone SVG 1.1 document (all text escaped, no external references), every caption in
 * plain words; it draws only what it is given and computes nothing it then hides.
 */
package org.precedence.cli.plot;
