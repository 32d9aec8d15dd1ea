package breakwater.report.chart;

import org.junit.jupiter.api.Test;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** Labels beside points: never over each other, over a reserved label, or outside the plot. */
class LabelPlacerTest {
    static final Rectangle2D PLOT = new Rectangle2D.Double(80, 10, 790, 330);

    @Test
    void closePointsGetLabelsThatDoNotOverlap() {
        // two anti-resonances a seventh of a decade apart at almost the same |Z| (as 1.19 and 1.7 MHz on a
        // demo rail), two more close pairs, and a reserved target label at the right
        LabelPlacer p = new LabelPlacer(ChartStyle.NOTE_FONT, PLOT);
        Rectangle2D target = new Rectangle2D.Double(760, 100, 100, 16);
        p.reserve(target);
        List<Rectangle2D> boxes = new ArrayList<>();
        double[][] points = {{400, 200}, {415, 205}, {700, 120}, {712, 118}, {800, 110}, {430, 210}};
        String[] labels = {"1.19 MHz", "1.7 MHz", "38.4 MHz", "71.4 MHz", "120 MHz", "2.2 MHz"};
        for (int i = 0; i < points.length; i++) {
            Rectangle2D b = p.place(labels[i], points[i][0], points[i][1], 6);
            if (b != null) {
                boxes.add(b);
                assertThat(PLOT.contains(b)).as(labels[i] + " inside the plot").isTrue();
                assertThat(b.intersects(target)).as(labels[i] + " clear of the target label").isFalse();
                // centred on its point, and clear of the point's marker
                assertThat(b.getCenterX()).isEqualTo(points[i][0]);
                assertThat(b.contains(points[i][0], points[i][1])).isFalse();
            }
        }
        assertThat(boxes).as("with room above and below, every label finds a place").hasSize(points.length);
        for (int i = 0; i < boxes.size(); i++) {
            for (int j = i + 1; j < boxes.size(); j++) {
                assertThat(boxes.get(i).intersects(boxes.get(j))).as(i + " against " + j).isFalse();
            }
        }
    }

    @Test
    void aLabelWithNoFreePlaceIsLeftOut() {
        // a plot with room for one label above the point and one below: the third label at the same point has nowhere to go
        Rectangle2D small = new Rectangle2D.Double(0, 0, 200, 50);
        LabelPlacer p = new LabelPlacer(ChartStyle.NOTE_FONT, small);
        assertThat(p.place("1 MHz", 100, 25, 2)).isNotNull();
        assertThat(p.place("1 MHz", 100, 25, 2)).isNotNull();
        assertThat(p.place("1 MHz", 100, 25, 2)).isNull();
    }
}
