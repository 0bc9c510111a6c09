/**
 * The randomizer service: seeded, verifiable turn orders over HTTP/JSON for engines in any
 * language ({@link org.precedence.runtime.service.RandomizerService}, endpoints under
 * {@code /v1}, described with examples in {@code docs/service.md}).
 *
 * <p>Promises:
 * <ul>
 *   <li>Stateless. A session is a token that seals (AES-256-GCM, JDK) its seed and parameters
 *       under a server key; replicas sharing the {@link org.precedence.runtime.service.KeyRing}
 *       serve every session alike. Altered or forged tokens are refused with a 4xx.</li>
 *   <li>Rounds served are exactly the provider's rounds for the same session, in O(1) per
 *       round whatever its number.</li>
 *   <li>Bounded: request bodies, player counts, simulations, logs, workers, queue and
 *       connection times all have limits ({@link org.precedence.runtime.service.ServiceLimits}).</li>
 *   <li>Every refused request gets a 4xx with a JSON body {@code {"error": code, "detail":
 *       one line}}; wrong method 405, unknown path 404; a 500 only for a failure of our own.</li>
 * </ul>
 */
package org.precedence.runtime.service;
