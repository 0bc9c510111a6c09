package org.precedence.api;

/** Which end of the rolled values acts first. */
public enum RankingConvention {
    /** The lowest face value acts first (the default everywhere in Precedence). */
    LOWEST_FIRST,
    /** The highest face value acts first. */
    HIGHEST_FIRST
}
