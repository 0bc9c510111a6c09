/**
 * Where served sets come from: {@link org.precedence.runtime.source.SetSource} answers "which
 * order-fair dice do n players roll?" — the shipped catalog first, the implicit construction
 * for every other n — and caches the answer per player count.
 */
package org.precedence.runtime.source;
