package org.annalist.chart;

import java.util.ArrayList;
import java.util.List;

/**
 * Rows for labels along a chart's top edge, so that no two overlap: each label, taken in order,
 * goes to the first row where it clears the labels already there and every span kept clear for
 * other marks (an arrow's label that reaches up into a row) by {@link #GAP} units. Positions are in
 * the chart's units (CSS pixels), measured from the plot's left edge.
 */
final class LabelRows {

    /** The clear space kept between two labels in one row, in chart units. */
    static final double GAP = 4;

    private final List<List<double[]>> rows = new ArrayList<>();

    /** Keeps {@code [left, right]} clear in row {@code row} (a mark other than a label of this set). */
    void block(int row, double left, double right) {
        while (rows.size() <= row) {
            rows.add(new ArrayList<>());
        }
        rows.get(row).add(new double[] {left, right});
    }

    /** Places a label spanning {@code [left, right]} in the first row where it fits, and returns that row. */
    int place(double left, double right) {
        for (int row = 0; ; row++) {
            if (row == rows.size()) {
                rows.add(new ArrayList<>());
            }
            boolean clear = true;
            for (double[] taken : rows.get(row)) {
                clear &= right + GAP <= taken[0] || taken[1] + GAP <= left;
            }
            if (clear) {
                rows.get(row).add(new double[] {left, right});
                return row;
            }
        }
    }
}
