package breakwater.report;

import breakwater.report.chart.ImpedanceChart;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Writes the invented example report to /tmp/report-example/ for a person to look at (render it with a
 * headless browser). Off by default: run with {@code -Dbreakwater.example=true -Dtest=ExampleReportWriter}.
 */
@Tag("example")
@EnabledIfSystemProperty(named = "breakwater.example", matches = "true")
class ExampleReportWriter {

    @Test
    void writeExample() throws IOException {
        Path dir = Path.of("/tmp/report-example");
        Files.createDirectories(dir);
        Path file = dir.resolve("report.html");
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            HtmlReport.write(ExampleReport.model(), w);
        }
        Files.writeString(dir.resolve("impedance.svg"), ImpedanceChart.svg(ExampleReport.model().impedance()));
        assertThat(Files.size(file)).isPositive();
    }
}
