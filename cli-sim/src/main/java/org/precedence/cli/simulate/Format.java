package org.precedence.cli.simulate;

import java.util.Locale;

/** Number formats shared by the reports. */
final class Format {
    private Format() {
    }

    static String p(double p) {
        if (p == 0) {
            return "< 1e-300";
        }
        if (p < 1e-4) {
            return String.format(Locale.ROOT, "%.2e", p);
        }
        return String.format(Locale.ROOT, "%.4f", p);
    }

    /** "p = 0.0123", or "p < 1e-300" when the tail underflowed. */
    static String pIs(double p) {
        return p == 0 ? "p < 1e-300" : "p = " + p(p);
    }

    static String chance(double p) {
        return String.format(Locale.ROOT, "%.1f", 100 * p);
    }

    static String pct(double fraction) {
        return String.format(Locale.ROOT, "%.1f%%", 100 * fraction);
    }

    static String count(long v) {
        return String.format(Locale.ROOT, "%,d", v);
    }

    static String fixed(double v, int decimals) {
        return String.format(Locale.ROOT, "%,." + decimals + "f", v);
    }
}
