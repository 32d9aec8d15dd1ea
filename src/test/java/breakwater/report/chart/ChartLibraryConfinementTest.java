package breakwater.report.chart;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The chart library stays behind this package: no main source file elsewhere imports JFreeChart or
 * JFreeSVG (both live under {@code org.jfree}), so the rest of the code depends only on SVG text.
 */
class ChartLibraryConfinementTest {
    private static final Path MAIN = Path.of("").toAbsolutePath().resolve("src/main/java");
    private static final Path CHART = MAIN.resolve("breakwater/report/chart");

    @Test
    void onlyTheChartPackageImportsTheChartLibrary() throws IOException {
        List<Path> importing;
        try (Stream<Path> files = Files.walk(MAIN)) {
            importing = files.filter(p -> p.toString().endsWith(".java")).filter(p -> {
                try {
                    return Files.readString(p).contains("import org.jfree.");
                } catch (IOException e) {
                    throw new IllegalStateException("cannot read " + p + ": " + e.getMessage(), e);
                }
            }).toList();
        }
        assertThat(importing).as("files importing org.jfree").isNotEmpty();
        assertThat(importing).allMatch(p -> p.getParent().equals(CHART), "in " + CHART);
    }
}
