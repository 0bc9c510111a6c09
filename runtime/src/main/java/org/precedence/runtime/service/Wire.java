package org.precedence.runtime.service;

import java.util.Locale;

/** How values are spelt on the wire: enum constants in lower snake case ({@code order_fair}). */
final class Wire {
    private Wire() {
    }

    static String name(Enum<?> value) {
        return value.name().toLowerCase(Locale.ROOT);
    }
}
