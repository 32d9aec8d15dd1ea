package breakwater.report.chart;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.text.TextUtils;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

import java.awt.geom.Rectangle2D;
import java.util.function.Supplier;

/**
 * Draws a chart into JFreeSVG and returns one {@code <svg>} element (no XML prolog, a {@code viewBox} so
 * the page can scale it). Rendering is headless and needs no GPU. Output is deterministic: element ids
 * come from a hash of the chart's data, not from the clock.
 */
public final class SvgWriter {
    static {
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
        // draw rotated labels as rotated text, not as glyph outlines: the SVG stays searchable and small
        TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    private SvgWriter() {
    }

    /**
     * Builds the chart and draws it as SVG of {@code width} × {@code height}. The chart is built here,
     * after this class has set up headless rendering, so no chart touches AWT before that.
     *
     * @param kind a short prefix naming the kind of chart; with {@code hash} it makes the element ids, so
     *             two different charts inlined in one page do not share ids
     */
    static String render(int width, int height, String kind, int hash, Supplier<JFreeChart> build) {
        Checks.require(width >= 100 && height >= 80, "chart size " + width + " × " + height
                + " is too small; use at least 100 × 80");
        JFreeChart chart = build.get();
        String prefix = kind + Integer.toHexString(hash);
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        g.setDefsKeyPrefix(prefix);
        g.setFontFunction(family -> ChartStyle.CSS_FAMILY);
        chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
        return stripProlog(g.getSVGElement(prefix, true, new ViewBox(0, 0, width, height), null, null));
    }

    /** Removes an XML declaration and a DOCTYPE, if present, so the SVG can be inlined in a page. */
    public static String stripProlog(String svg) {
        String s = svg.strip();
        if (s.startsWith("<?xml")) {
            s = s.substring(s.indexOf("?>") + 2).strip();
        }
        if (s.regionMatches(true, 0, "<!DOCTYPE", 0, 9)) {
            s = s.substring(s.indexOf('>') + 1).strip();
        }
        return s;
    }
}
