package org.precedence.api;

/**
 * How fair a dice set is, strongest first. Each grade implies the ones after it.
 */
public enum FairnessGrade {
    /** Every one of the n! rankings of the dice is exactly equally likely. */
    ORDER_FAIR,
    /** Each die is exactly equally likely to land in each position of the ranking. */
    SEAT_FAIR,
    /** Each die is exactly equally likely to act first (under the stated convention). */
    LEAD_FAIR,
    /** None of the above holds. */
    UNFAIR;

    /** Returns whether this grade is at least as strong as {@code other}. */
    public boolean atLeast(FairnessGrade other) {
        return ordinal() <= other.ordinal();
    }
}
