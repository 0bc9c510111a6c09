/** Test-only stand-ins for the turn-order provider. */
package org.precedence.game.fake;
