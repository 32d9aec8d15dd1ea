package breakwater.report.chart;

import java.awt.Font;
import java.awt.font.FontRenderContext;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/**
 * Places text labels beside points of a chart so that no two labels, and no label and a reserved area
 * (another label the chart draws, such as a limit's), overlap. Works in the plot's pixel space: the
 * caller maps data to pixels. Each label tries, in order, the slots above its point, stacked one text
 * height at a time, then the slots below it; a label with no free slot inside the plot is left out
 * (its value is in the report's tables), never drawn over another.
 */
final class LabelPlacer {
    /** Stacked slots tried on each side of the point before giving up. */
    private static final int LEVELS = 4;
    /** Space kept between a label and its point, and between labels, in pixels. */
    private static final double GAP = 3;
    private static final FontRenderContext CONTEXT = new FontRenderContext(null, true, true);

    private final Font font;
    private final Rectangle2D plot;
    private final List<Rectangle2D> taken = new ArrayList<>();

    /** Labels in {@code font} inside {@code plot} (pixels, y downwards). */
    LabelPlacer(Font font, Rectangle2D plot) {
        this.font = font;
        this.plot = plot;
    }

    /** An area no label may cover (e.g. a limit line's own label). */
    void reserve(Rectangle2D area) {
        taken.add(area);
    }

    /** The text's width and height in this font, in pixels. */
    Rectangle2D size(String text) {
        return font.getStringBounds(text, CONTEXT);
    }

    /**
     * The box (pixels) where {@code text} goes, centred horizontally on the point ({@code x}, {@code y}),
     * or null when every slot is taken or outside the plot. The box is then reserved.
     */
    Rectangle2D place(String text, double x, double y, double pointRadius) {
        Rectangle2D s = size(text);
        double w = s.getWidth() + 2 * GAP;
        double h = s.getHeight() + GAP;
        for (int side = 0; side < 2; side++) {
            for (int level = 0; level < LEVELS; level++) {
                double top = side == 0 ? y - pointRadius - GAP - h * (level + 1) : y + pointRadius + GAP + h * level;
                Rectangle2D box = new Rectangle2D.Double(x - w / 2, top, w, h);
                if (plot.contains(box) && taken.stream().noneMatch(box::intersects)) {
                    taken.add(box);
                    return box;
                }
            }
        }
        return null;
    }

    /** Every box placed or reserved so far. */
    List<Rectangle2D> taken() {
        return List.copyOf(taken);
    }
}
