package breakwater.report.chart;

import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.LogTick;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.Tick;
import org.jfree.chart.ui.RectangleEdge;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.text.CharacterIterator;
import java.util.ArrayList;
import java.util.List;

/** The axes the charts share, styled by {@link ChartStyle} and labelled in engineering notation. */
final class Axes {
    private Axes() {
    }

    /**
     * Log axis from the decade at or below {@code min} to the decade at or above {@code max}
     * ({@code wholeDecades}) or to {@code max} itself, with one labelled tick per decade and nine minor
     * ticks between.
     */
    static LogAxis logAxis(String label, String unit, double min, double max, boolean wholeDecades) {
        LogAxis a = new TextLogAxis(label);
        ChartStyle.styleAxis(a);
        double lo = Math.pow(10, Math.floor(Math.log10(min) + 1e-9));
        double hi = wholeDecades ? Math.pow(10, Math.ceil(Math.log10(max) - 1e-9)) : max;
        if (hi <= lo) {
            hi = lo * 10;
        }
        a.setSmallestValue(lo / 10);
        a.setAutoRange(false);
        // a hair wider than the decades, so the ticks at both ends survive the range check
        a.setRange(lo / 1.0001, hi * 1.0001);
        a.setAutoTickUnitSelection(false);
        // one decade per major tick; ten minor intervals, spaced linearly in value (2, 3, … 9 × 10^n)
        a.setTickUnit(new NumberTickUnit(1.0, ChartStyle.logTicks(unit), 10), false, true);
        a.setMinorTickMarksVisible(true);
        a.setNumberFormatOverride(ChartStyle.logTicks(unit));
        return a;
    }

    /**
     * A log axis whose tick labels are plain strings. The stock axis labels ticks with attributed strings
     * (for superscript exponents), which SVG output receives as glyph outlines instead of text.
     */
    private static final class TextLogAxis extends LogAxis {
        TextLogAxis(String label) {
            super(label);
        }

        @Override
        @SuppressWarnings({"rawtypes", "unchecked"})
        public List refreshTicks(Graphics2D g2, AxisState state, Rectangle2D dataArea,
                                 RectangleEdge edge) {
            List<Tick> out = new ArrayList<>();
            for (Object o : super.refreshTicks(g2, state, dataArea, edge)) {
                if (o instanceof LogTick t) {
                    String text = "";
                    if (t.getAttributedLabel() != null) {
                        StringBuilder b = new StringBuilder();
                        var it = t.getAttributedLabel().getIterator();
                        for (char c = it.first(); c != CharacterIterator.DONE; c = it.next()) {
                            b.append(c);
                        }
                        text = b.toString();
                    }
                    out.add(new NumberTick(t.getTickType(), t.getValue(), text, t.getTextAnchor(),
                            t.getRotationAnchor(), t.getAngle()));
                } else {
                    out.add((Tick) o);
                }
            }
            return out;
        }
    }

    /** Linear axis over {@code lo} .. {@code hi} (widened by 1 % if empty), ticks on one SI prefix. */
    static NumberAxis linearAxis(String label, String unit, double lo, double hi) {
        if (!(hi > lo)) {
            double pad = lo == 0 ? 1 : Math.abs(lo) * 0.01;
            lo -= pad;
            hi += pad;
        }
        NumberAxis a = new NumberAxis(label);
        ChartStyle.styleAxis(a);
        a.setAutoRange(false);
        a.setRange(lo, hi);
        a.setNumberFormatOverride(ChartStyle.linearTicks(unit, lo, hi));
        return a;
    }

    /** Axis of counts from 0 to {@code top}, about six ticks on a 1–2–5 step of whole numbers. */
    static NumberAxis countAxis(String label, double top) {
        NumberAxis y = new NumberAxis(label);
        ChartStyle.styleAxis(y);
        y.setAutoRange(false);
        y.setRange(0, top);
        y.setTickUnit(new NumberTickUnit(niceStep(top / 6), ChartStyle.plainTicks("", 0, 100)), false, true);
        return y;
    }

    /** The 1–2–5 step at or above {@code raw}, at least 1 (counts are integers). */
    static double niceStep(double raw) {
        if (raw <= 1) {
            return 1;
        }
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[]{1, 2, 5, 10}) {
            if (m * p >= raw * (1 - 1e-12)) {
                return m * p;
            }
        }
        return 10 * p;
    }
}
