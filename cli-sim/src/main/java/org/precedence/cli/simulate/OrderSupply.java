package org.precedence.cli.simulate;

/**
 * Where a simulation's turn orders come from: the provider, or one of the peers it is compared
 * with. Thread-safe; {@link #open} is called once per session by whichever worker runs it.
 */
interface OrderSupply {

    /** A short name for reports ("precedence", "shuffle", "d6 re-roll"). */
    String label();

    /** Opens session {@code session} (0-based) for {@code players} players. */
    SessionOrders open(long session, int players);
}
