package org.precedence.runtime.provider;

import org.precedence.runtime.source.SetSource;
import org.precedence.runtime.source.SetSources;

/** The sets a provider serves when none is given: the standard source, small sets listed. */
final class DefaultSets {
    private static final SetSource DEFAULT = new ListedSets(SetSources.standard());

    private DefaultSets() {
    }

    static SetSource get() {
        return DEFAULT;
    }
}
