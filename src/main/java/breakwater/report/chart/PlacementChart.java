package breakwater.report.chart;

import java.util.List;
import java.util.Locale;

/**
 * The placement view (docs/network-model.md#placement-regions): the load's connection on the left, then one
 * box per region in the scenario's order, each with its spreading path, the parts placed there and a bar
 * of the room they use. Plain SVG text and rectangles, written directly (no chart library), deterministic.
 */
public final class PlacementChart {
    static final int BOX_WIDTH = 210;
    static final int GAP = 26;
    static final int LINE_HEIGHT = 17;
    static final int TOP = 46;

    /**
     * One region's box.
     *
     * @param name      the region's name
     * @param path      its spreading path, formatted ("0.05 mΩ + 8 pH")
     * @param placed    what is placed, formatted ("32 parts of 40")
     * @param roomUsed  share of the region's room in use, 0…1 (more than 1: over its room), NaN when unlimited
     * @param lines     one line per part type placed ("24 × C0201-X5R-100N-10"), and per-case room lines
     */
    public record Box(String name, String path, String placed, double roomUsed, List<String> lines) {
        public Box {
            Checks.require(name != null && path != null && placed != null, "placement box with a null text");
            lines = List.copyOf(lines);
        }
    }

    private PlacementChart() {
    }

    /** The view of {@code boxes} as one {@code <svg>} element. */
    public static String svg(String loadLabel, List<Box> boxes) {
        int maxLines = boxes.stream().mapToInt(b -> b.lines().size()).max().orElse(0);
        int boxHeight = 3 * LINE_HEIGHT + 18 + maxLines * LINE_HEIGHT + 12;
        int left = 150;
        int width = left + boxes.size() * (BOX_WIDTH + GAP) + 10;
        int height = TOP + boxHeight + 20;
        StringBuilder s = new StringBuilder();
        s.append(String.format(Locale.ROOT, "<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 %d %d\" width=\"%d\" "
                + "style=\"max-width:100%%;height:auto\" data-height=\"%d\" font-family=\"sans-serif\" font-size=\"13\" role=\"img\" aria-label=\"placement of the "
                + "bank by region\">%n", width, height, width, height));
        // the board node as a rail across the top, the load's connection at its left end
        int railY = TOP - 18;
        s.append(String.format(Locale.ROOT, "<line x1=\"20\" y1=\"%d\" x2=\"%d\" y2=\"%d\" stroke=\"#555\" stroke-width=\"3\"/>%n",
                railY, width - 10, railY));
        s.append(String.format(Locale.ROOT, "<text x=\"20\" y=\"%d\" fill=\"#222\">%s</text>%n", railY - 8, esc(loadLabel)));
        for (int k = 0; k < boxes.size(); k++) {
            Box b = boxes.get(k);
            int x = left + k * (BOX_WIDTH + GAP);
            int cx = x + BOX_WIDTH / 2;
            s.append(String.format(Locale.ROOT, "<line x1=\"%d\" y1=\"%d\" x2=\"%d\" y2=\"%d\" stroke=\"#555\" "
                    + "stroke-width=\"2\" stroke-dasharray=\"5 3\"/>%n", cx, railY, cx, TOP));
            boolean over = b.roomUsed() > 1;
            s.append(String.format(Locale.ROOT, "<rect x=\"%d\" y=\"%d\" width=\"%d\" height=\"%d\" rx=\"6\" fill=\"#f7f9fc\" "
                    + "stroke=\"%s\" stroke-width=\"%s\"/>%n", x, TOP, BOX_WIDTH, boxHeight, over ? "#b2182b" : "#999",
                    over ? "2.5" : "1"));
            int y = TOP + LINE_HEIGHT + 2;
            s.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"%d\" font-weight=\"bold\" fill=\"#222\">%s</text>%n",
                    x + 10, y, esc(b.name())));
            y += LINE_HEIGHT;
            s.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"%d\" fill=\"#555\">path %s</text>%n", x + 10, y,
                    esc(b.path())));
            y += LINE_HEIGHT;
            s.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"%d\" fill=\"%s\">%s</text>%n", x + 10, y,
                    over ? "#b2182b" : "#222", esc(b.placed())));
            y += 8;
            if (!Double.isNaN(b.roomUsed())) {
                int barWidth = BOX_WIDTH - 20;
                int used = (int) Math.round(barWidth * Math.min(1, Math.max(0, b.roomUsed())));
                s.append(String.format(Locale.ROOT, "<rect x=\"%d\" y=\"%d\" width=\"%d\" height=\"8\" fill=\"#e3e7ee\"/>%n",
                        x + 10, y, barWidth));
                s.append(String.format(Locale.ROOT, "<rect x=\"%d\" y=\"%d\" width=\"%d\" height=\"8\" fill=\"%s\"/>%n",
                        x + 10, y, used, over ? "#b2182b" : "#0072b2"));
            }
            y += 10;
            for (String line : b.lines()) {
                y += LINE_HEIGHT;
                s.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"%d\" fill=\"#222\">%s</text>%n", x + 10, y,
                        esc(line)));
            }
        }
        s.append("</svg>");
        return s.toString();
    }

    private static String esc(String t) {
        return t.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
