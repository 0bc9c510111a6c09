/**
 * {@code precedence simulate}: rolls many sessions through the very provider an engine uses and
 * reports, in numbers and plain words, how evenly turn orders came out.
 *
 * <p>Promises:
 * <ul>
 *   <li>Results are a pure function of the options: work is cut into chunks of whole sessions
 *       fixed by the session count alone, each session's rounds come from its own seed, and
 *       chunk results are merged in chunk order, so the thread count never changes a figure.</li>
 *   <li>Counts add up: every ranking count, seat count and lead count sums to the rounds
 *       actually simulated (sessions × rounds unless the run was interrupted, which the
 *       result states).</li>
 *   <li>Every p-value comes from a well-kept statistics library (Apache Commons Math) applied
 *       to a statistic whose null distribution is stated in the Javadoc of
 *       {@link org.precedence.cli.simulate.FrequencyTests}.</li>
 *   <li>Interrupting a run (Ctrl-C) stops the workers at their next check point and prints
 *       the partial result; nothing is half-written.</li>
 * </ul>
 */
package org.precedence.cli.simulate;
