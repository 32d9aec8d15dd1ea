package breakwater.report.chart;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Expected labels follow the SI prefixes of the SI Brochure (BIPM, 9th edition, 2019, Table 7: f 10⁻¹⁵,
 * p 10⁻¹², n 10⁻⁹, µ 10⁻⁶, m 10⁻³, k 10³, M 10⁶, G 10⁹, T 10¹²) with engineering notation's exponents in
 * steps of three (common practice). The minus sign U+2212 is the typographic minus of ISO 80000-1.
 */
class EngineeringFormatTest {

    @ParameterizedTest(name = "{0} {1} -> {2}")
    @CsvSource(delimiter = '|', value = {
            "1e4        | Hz | 10 kHz",
            "1.5e6      | Hz | 1.5 MHz",
            "150e6      | Hz | 150 MHz",
            "1e3        | Hz | 1 kHz",
            "1e9        | Hz | 1 GHz",
            "1          | Hz | 1 Hz",
            "0.1        | Ω  | 100 mΩ",
            "1e-3       | Ω  | 1 mΩ",
            "0.01       | Ω  | 10 mΩ",
            "1e-4       | Ω  | 100 µΩ",
            "9.5e-3     | Ω  | 9.5 mΩ",
            "4.7e-6     | F  | 4.7 µF",
            "2.2e-12    | F  | 2.2 pF",
            "5e-7       | s  | 500 ns",
            "1.5e-15    | s  | 1.5 fs",
            "2.5e12     | Hz | 2.5 THz",
            "-0.005     | A  | −5 mA",
            "0          | Ω  | 0 Ω",
            // four significant digits; rounding up to 1000 moves to the next prefix
            "123456     | Hz | 123.5 kHz",
            "999.96     | Hz | 1 kHz",
            "0.99999999 | V  | 1 V",
    })
    void perValueLabels(double value, String unit, String expected) {
        assertThat(EngineeringFormat.perValue(unit).text(value)).isEqualTo(expected);
    }

    @Test
    void everyDecadeAsComputedByALogAxisGetsAWholeMantissa() {
        // A log axis computes its ticks as 10^k; those doubles are not always exact (10^-5 is not), and the
        // label must still read 1, 10 or 100 with the right prefix.
        String[] prefixes = {"f", "p", "n", "µ", "m", "", "k", "M", "G"};
        for (int k = -15; k < 12; k++) {
            String expected = (k - Math.floorDiv(k, 3) * 3 == 0 ? "1" : k - Math.floorDiv(k, 3) * 3 == 1 ? "10" : "100")
                    + " " + prefixes[Math.floorDiv(k, 3) + 5] + "Hz";
            assertThat(EngineeringFormat.perValue("Hz").text(Math.pow(10, k))).as("10^%d", k).isEqualTo(expected);
        }
    }

    @ParameterizedTest(name = "{0} .. {1} {2}: {3} -> {4}")
    @CsvSource(delimiter = '|', value = {
            "0    | 1.6e-6 | s   | 5e-7                | 0.5 µs",
            "0    | 1.6e-6 | s   | 1.2e-6              | 1.2 µs",
            // float noise at a zero tick must not print as a tiny number
            "0    | 1.6e-6 | s   | 2.7e-17             | 0 µs",
            "0    | 1.6e-6 | s   | -2.7e-17            | 0 µs",
            "0    | 40e-9  | s   | 2.5e-8              | 25 ns",
            "0.92 | 0.98   | V   | 0.94                | 0.94 V",
            "0.92 | 0.98   | V   | 0.9215              | 0.9215 V",
            "3    | 6      | A   | 3.5                 | 3.5 A",
            "0.01 | 0.07   | V   | 0.025               | 25 mV",
            "-2   | 2      | A   | -1.5                | −1.5 A",
    })
    void oneprefixPerAxis(double lower, double upper, String unit, double value, String expected) {
        assertThat(EngineeringFormat.forRange(unit, lower, upper).text(value)).isEqualTo(expected);
    }

    @ParameterizedTest(name = "plain {3} -> {4}")
    @CsvSource(delimiter = '|', value = {
            "0.5 | 2.3  | USD | 0.6000000000000001 | 0.6 USD",
            "0.5 | 2.3  | USD | 2                  | 2 USD",
            "0   | 2000 | ''  | 1500               | 1500",
    })
    void plainNumbersTakeNoPrefix(double lower, double upper, String unit, double value, String expected) {
        assertThat(EngineeringFormat.plain(unit, lower, upper).text(value)).isEqualTo(expected);
    }

    @Test
    void worksAsAJavaTextNumberFormat() {
        // what a chart axis calls: NumberFormat.format(double)
        java.text.NumberFormat f = EngineeringFormat.perValue("Hz");
        assertThat(f.format(1e4)).isEqualTo("10 kHz");
        assertThat(f.format(2L)).isEqualTo("2 Hz");
        assertThat(f.parse("10 kHz", new java.text.ParsePosition(0))).isNull();
    }
}
