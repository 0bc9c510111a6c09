package org.precedence.cli.plot;

import java.util.List;
import java.util.Objects;

/**
 * The figures one panel of the plot shows: one player count of one simulation.
 *
 * @param title         heading of the panel ("4 players — precedence dice")
 * @param players       players per round
 * @param rounds        rounds behind the counts
 * @param barLabels     one label per bar (rankings, or players when rankings are not counted)
 * @param barCounts     counts parallel to {@code barLabels}
 * @param barsAreOrders whether the bars are whole turn orders (else: who went first)
 * @param expected      the count every bar would have with perfectly even luck
 * @param low           lower edge of the 95 % band
 * @param high          upper edge of the 95 % band
 * @param seatCounts    {@code seatCounts[player][position]}
 */
public record PlotPanel(String title, int players, long rounds, List<String> barLabels, long[] barCounts,
                        boolean barsAreOrders, double expected, double low, double high, long[][] seatCounts) {
    public PlotPanel {
        Objects.requireNonNull(title, "title");
        barLabels = List.copyOf(barLabels);
        barCounts = barCounts.clone();
        if (barLabels.size() != barCounts.length) {
            throw new IllegalArgumentException("one label per bar needed");
        }
        if (seatCounts.length != players) {
            throw new IllegalArgumentException("seat matrix must have one row per player");
        }
    }

    @Override
    public long[] barCounts() {
        return barCounts.clone();
    }
}
