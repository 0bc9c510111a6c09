package org.precedence.api;

/** Which counter-based generator turns (seed, round, player, digit, attempt) into bits. */
public enum RandomnessMode {
    /** A fast counter-based generator; observed rounds may in principle reveal the seed. */
    FAST,
    /** A cryptographic primitive: observed rounds reveal nothing about other rounds. */
    SECURE
}
