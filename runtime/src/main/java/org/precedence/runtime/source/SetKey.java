package org.precedence.runtime.source;

import org.precedence.api.FairnessGrade;

/** The cache key: a player count and the grade asked for. */
record SetKey(int players, FairnessGrade grade) {
}
