/**
 * Session logs and their replay. A {@link org.precedence.runtime.replay.SessionRecorder} plays
 * rounds and records them; {@link org.precedence.runtime.replay.SessionLogFiles} writes the log
 * as JSON atomically (temp file in the same directory, fsync, atomic rename) and reads it back
 * strictly; {@link org.precedence.runtime.replay.Replayer} checks the commitment against the
 * revealed seed and recomputes every round, reporting the first {@link
 * org.precedence.runtime.replay.Mismatch}.
 *
 * <p>Promises: a log that was not written completely never appears under its name; a log
 * that does not parse, or lacks a field, is rejected with {@link
 * org.precedence.runtime.replay.MalformedLogException} naming the field and round; any edit to
 * the recorded faces, orders, set hash, commitment or seed is reported as a mismatch.
 */
package org.precedence.runtime.replay;
