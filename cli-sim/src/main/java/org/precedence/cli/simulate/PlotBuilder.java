package org.precedence.cli.simulate;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.precedence.cli.plot.PlotPanel;
import org.precedence.cli.plot.SimulationPlot;
import org.precedence.runtime.dice.DieNames;

/** Hands a report's figures to the plot package: one panel per player count. */
final class PlotBuilder {
    private PlotBuilder() {
    }

    static String svg(SimulationReport report) {
        List<PlotPanel> panels = new ArrayList<>();
        StringBuilder summary = new StringBuilder();
        for (SimulationReport.PlayerCount pc : report.counts()) {
            SupplyResult r = pc.main();
            panels.add(panel(r));
            summary.append(r.players()).append(" players: ").append(Verdict.of(r)).append(' ');
        }
        if (!report.complete()) {
            summary.append("(Interrupted: only the rounds simulated before the stop are shown.)");
        }
        String heading = String.format(Locale.ROOT, "Turn-order fairness: %s sessions of %s rounds (seed \"%s\")",
                Format.count(report.sessions()), Format.count(report.roundsPerSession()), report.seed());
        return SimulationPlot.svg(heading, summary.toString().strip(), panels);
    }

    static PlotPanel panel(SupplyResult r) {
        String title = String.format(Locale.ROOT, "%d players, %s rounds, a fresh order every round",
                r.players(), Format.count(r.rounds()));
        if (r.rankingsCounted()) {
            SupplyResult.Band b = r.band();
            return new PlotPanel(title, r.players(), r.rounds(), r.rankingNames(), r.rankingCounts(), true,
                    b.expected(), b.low(), b.high(), r.seatCounts());
        }
        List<String> names = new ArrayList<>();
        for (int p = 0; p < r.players(); p++) {
            names.add(DieNames.of(p));
        }
        SupplyResult.Band b = Analysis.band(r.leadCounts(), r.rounds());
        return new PlotPanel(title, r.players(), r.rounds(), names, r.leadCounts(), false,
                b.expected(), b.low(), b.high(), r.seatCounts());
    }
}
