package org.precedence.runtime.provider;

import org.precedence.runtime.source.SetSource;

/** The sets a provider serves when none is given. */
final class DefaultSets {
    private static final SetSource DEFAULT = new BuiltInSets();

    private DefaultSets() {
    }

    static SetSource get() {
        return DEFAULT;
    }
}
