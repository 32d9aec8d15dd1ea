package breakwater.report;

import breakwater.units.Quantity;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** Console text: one precision per column, tables whose headers never run together, wrapped explanations. */
class ConsoleTextTest {

    @Test
    void voltagesAndImpedancesKeepThreeSignificantDigits() {
        assertThat(Figures.format(0.029, Quantity.VOLTAGE)).isEqualTo("29.0 mV");
        assertThat(Figures.format(0.0281, Quantity.VOLTAGE)).isEqualTo("28.1 mV");
        assertThat(Figures.format(0.005, Quantity.VOLTAGE)).isEqualTo("5.00 mV");
        assertThat(Figures.format(-0.00225, Quantity.VOLTAGE)).isEqualTo("-2.25 mV");
        assertThat(Figures.format(0.0013, Quantity.RESISTANCE)).isEqualTo("1.30 mΩ");
        // inputs echoed as given: a band edge stays "10 kHz"
        assertThat(Figures.format(1e4, Quantity.FREQUENCY)).isEqualTo("10 kHz");
        // rail voltages: four significant digits on both sides of a comparison
        assertThat(ConsoleReport.volts(0.876)).isEqualTo("0.8760 V");
        assertThat(ConsoleReport.volts(0.8731)).isEqualTo("0.8731 V");
        assertThat(ConsoleReport.volts(1.0)).isEqualTo("1.000 V");
        // money the same in the console and the report: four decimals
        assertThat(Texts.money(0.04)).isEqualTo("0.0400");
        assertThat(HtmlReport.money(0.04)).isEqualTo("0.0400");
        assertThat(HtmlReport.money(1.623)).isEqualTo("1.6230");
    }

    @Test
    void tableHeadersAreSeparatedAndAligned() {
        String t = new ConsoleTable(List.of("footprint", "worst droop", "worst overshoot", "verdict"),
                false, true, true, false)
                .row(List.of("two-via", "27.7 mV", "26.2 mV", "FAILS SPEC"))
                .row(List.of("via-in-pad", "25.2 mV", "23.7 mV", "MEETS SPEC")).render();
        List<String> lines = t.lines().toList();
        assertThat(lines.get(0)).contains("worst droop  worst overshoot");
        assertThat(lines.get(1)).matches("  -+  -+  -+  -+");
        // figures right-aligned under their header's end
        int end = lines.get(0).indexOf("worst overshoot") + "worst overshoot".length();
        assertThat(lines.get(2).substring(0, end)).endsWith("26.2 mV");
        assertThat(lines.get(3).substring(0, end)).endsWith("23.7 mV");
    }

    @Test
    void explanationsWrapToTheWidthUnderTheirTextColumn() {
        String text = "Frontier   " + "word ".repeat(40).strip();
        String wrapped = Texts.wrap(text, " ".repeat(11), 60);
        List<String> lines = wrapped.lines().toList();
        assertThat(lines).hasSizeGreaterThan(1).allSatisfy(l -> assertThat(l.length()).isLessThanOrEqualTo(60));
        assertThat(lines.get(0)).startsWith("Frontier   word");
        assertThat(lines.subList(1, lines.size())).allSatisfy(l -> assertThat(l).startsWith("           word"));
        assertThat(String.join(" ", lines).replaceAll(" +", " ")).isEqualTo(text.replaceAll(" +", " "));
        // a short line keeps its own spacing
        assertThat(Texts.wrap("Rail       x  PASS", "   ", 60)).isEqualTo("Rail       x  PASS\n");
    }
}
