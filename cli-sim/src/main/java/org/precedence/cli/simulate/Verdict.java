package org.precedence.cli.simulate;

import java.util.Locale;

/** One plain-words sentence per test result, the same in the text report and in the plot. */
final class Verdict {
    private Verdict() {
    }

    /** Says what the main p-value means for a player. */
    static String of(SupplyResult r) {
        double p = r.main().pValue();
        String what = r.rankingsCounted() ? "turn orders" : "seats";
        if (p < SimulationReport.FLAG_BELOW) {
            return String.format(Locale.ROOT, "Clearly uneven: %,d rounds show some %s coming up more "
                    + "often than others, far beyond what luck explains (%s). These dice are not fair.",
                    r.rounds(), what, Format.pIs(p));
        }
        if (p < 0.01) {
            return String.format(Locale.ROOT, "Unusually uneven (%s): luck alone gives counts this far "
                    + "apart about %s in a hundred runs. Worth a longer run with another seed.",
                    Format.pIs(p), Format.chance(p));
        }
        return String.format(Locale.ROOT, "Nothing suspicious: %,d rounds came out as evenly as fair dice "
                + "do (%s; only a p below 0.000001 would flag these dice).", r.rounds(), Format.pIs(p));
    }
}
