/**
 * Writing files so that nothing is ever half-written: {@link
 * org.precedence.runtime.files.AtomicWrite} is the one implementation every writer of the
 * project (catalog, set files, session logs, the command line's outputs) goes through.
 */
package org.precedence.runtime.files;
