package breakwater.units;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Locale;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Reading and writing engineering notation.
 *
 * <p>Sources of the expected values:
 * <ul>
 *   <li>SI prefixes f p n µ m k M G and their factors: BIPM, The International System of Units (SI
 *       Brochure, 9th edition, 2019), Table 7.</li>
 *   <li>Unit symbols F, H, Ω, V, A, Hz, s: same brochure, Table 4 (coherent derived units); "Ohm"/"ohm"
 *       spelled out is common practice where Ω cannot be typed.</li>
 *   <li>Letter in place of the decimal point (4u7, 2m2, R47, 4R7, 1k5, n47): IEC 60062 "Marking codes for
 *       resistors and capacitors", the letter code for values (cited from memory: R marks the decimal point
 *       for ohms, a prefix letter marks it and scales the value).</li>
 * </ul>
 * Tolerance: the parser multiplies a decimal mantissa by a power of ten, which is not exact in binary
 * floating point; a relative error of 1e-12 (about 5000 ulps) is far below any meaningful digit and far
 * above the few-ulp rounding that can occur.
 */
class EngineeringNotationTest {

    private static final double REL = 1e-12;

    static Stream<Arguments> valid() {
        return Stream.of(
                // plain SI numbers and exponents
                Arguments.of("0.1", Quantity.CAPACITANCE, 0.1),
                Arguments.of("2.2e-6", Quantity.CAPACITANCE, 2.2e-6),
                Arguments.of("1E3", Quantity.FREQUENCY, 1000.0),
                Arguments.of("-0.5", Quantity.VOLTAGE, -0.5),
                Arguments.of(".5", Quantity.VOLTAGE, 0.5),
                // every SI prefix of the list, with and without the unit symbol
                Arguments.of("100f", Quantity.CAPACITANCE, 100e-15),
                Arguments.of("25 pH", Quantity.INDUCTANCE, 25e-12),
                Arguments.of("100n", Quantity.CAPACITANCE, 100e-9),
                Arguments.of("100nF", Quantity.CAPACITANCE, 100e-9),
                Arguments.of("0.1u", Quantity.CAPACITANCE, 0.1e-6),
                Arguments.of("10 µF", Quantity.CAPACITANCE, 10e-6),
                Arguments.of("10 μF", Quantity.CAPACITANCE, 10e-6), // Greek mu U+03BC, not micro sign U+00B5
                Arguments.of("0.5 mOhm", Quantity.RESISTANCE, 0.5e-3),
                Arguments.of("0.5mΩ", Quantity.RESISTANCE, 0.5e-3),
                Arguments.of("0.5 m\u2126", Quantity.RESISTANCE, 0.5e-3), // OHM SIGN U+2126
                Arguments.of("3 ohm", Quantity.RESISTANCE, 3.0),
                Arguments.of("10 kHz", Quantity.FREQUENCY, 10e3),
                Arguments.of("150 MHz", Quantity.FREQUENCY, 150e6),
                Arguments.of("1.2 GHz", Quantity.FREQUENCY, 1.2e9),
                Arguments.of("0.95 V", Quantity.VOLTAGE, 0.95),
                Arguments.of("6 A", Quantity.CURRENT, 6.0),
                Arguments.of("300 mA", Quantity.CURRENT, 0.3),
                Arguments.of("0.5 ns", Quantity.TIME, 0.5e-9),
                Arguments.of("30 s", Quantity.TIME, 30.0),
                Arguments.of("18 nH", Quantity.INDUCTANCE, 18e-9),
                Arguments.of("1 F", Quantity.CAPACITANCE, 1.0),
                // percent for fractions; a plain number is a ratio
                Arguments.of("3 %", Quantity.FRACTION, 0.03),
                Arguments.of("50%", Quantity.FRACTION, 0.5),
                Arguments.of("0.03", Quantity.FRACTION, 0.03),
                // IEC 60062 letter as decimal point
                Arguments.of("4u7", Quantity.CAPACITANCE, 4.7e-6),
                Arguments.of("4µ7", Quantity.CAPACITANCE, 4.7e-6),
                Arguments.of("4u7F", Quantity.CAPACITANCE, 4.7e-6),
                Arguments.of("2m2", Quantity.RESISTANCE, 2.2e-3),
                Arguments.of("R47", Quantity.RESISTANCE, 0.47),
                Arguments.of("4R7", Quantity.RESISTANCE, 4.7),
                Arguments.of("1k5", Quantity.RESISTANCE, 1500.0),
                Arguments.of("n47", Quantity.CAPACITANCE, 0.47e-9),
                Arguments.of("10R", Quantity.RESISTANCE, 10.0),
                // surrounding and inner spaces
                Arguments.of("  0.5   mOhm ", Quantity.RESISTANCE, 0.5e-3),
                Arguments.of("1k", Quantity.PLAIN, 1000.0));
    }

    @ParameterizedTest(name = "{0} as {1}")
    @MethodSource("valid")
    void readsValidNotation(String text, Quantity quantity, double expected) throws NotationException {
        double actual = EngineeringNotation.parse(text, quantity);

        assertThat(actual).isCloseTo(expected, within(Math.abs(expected) * REL));
    }

    static Stream<Arguments> invalid() {
        return Stream.of(
                Arguments.of("10nH", Quantity.CAPACITANCE, "is an inductance (H), but a capacitance is expected"),
                Arguments.of("10 pF", Quantity.INDUCTANCE, "is a capacitance (F), but an inductance is expected"),
                Arguments.of("5 V", Quantity.RESISTANCE, "is a voltage (V), but a resistance is expected"),
                Arguments.of("3 %", Quantity.CAPACITANCE, "a percentage is not a capacitance"),
                Arguments.of("10 nX", Quantity.CAPACITANCE, "unknown unit or prefix 'X'"),
                Arguments.of("10 qF", Quantity.CAPACITANCE, "unknown unit or prefix 'qF'"),
                Arguments.of("", Quantity.CAPACITANCE, "empty value where a capacitance is expected"),
                Arguments.of("   ", Quantity.RESISTANCE, "empty value"),
                Arguments.of("abc", Quantity.CAPACITANCE, "does not start with a number"),
                Arguments.of("1..2", Quantity.CAPACITANCE, "is not a number"),
                Arguments.of("-", Quantity.VOLTAGE, "does not start with a number"),
                Arguments.of("1e999", Quantity.VOLTAGE, "is not a finite number"),
                Arguments.of("4R7", Quantity.CAPACITANCE, "the R form of IEC 60062 is for resistance"),
                Arguments.of("3 m%", Quantity.FRACTION, "a fraction takes no SI prefix"),
                Arguments.of("4u7 nF", Quantity.CAPACITANCE, "unknown unit or prefix 'nF'"),
                Arguments.of("0,5 mOhm", Quantity.RESISTANCE, "a comma is not a decimal separator"),
                Arguments.of("$0.10", Quantity.PLAIN, "does not start with a number"));
    }

    @ParameterizedTest(name = "{0} as {1}")
    @MethodSource("invalid")
    void refusesInvalidNotationSayingWhy(String text, Quantity quantity, String why) {
        assertThatThrownBy(() -> EngineeringNotation.parse(text, quantity))
                .isInstanceOf(NotationException.class)
                .hasMessageContaining(why);
    }

    static Stream<Arguments> formatted() {
        return Stream.of(
                Arguments.of(4.7e-6, Quantity.CAPACITANCE, "4.7 µF"),
                Arguments.of(100e-9, Quantity.CAPACITANCE, "100 nF"),
                Arguments.of(0.45e-9, Quantity.INDUCTANCE, "0.45 nH"),
                Arguments.of(25e-12, Quantity.INDUCTANCE, "25 pH"),
                Arguments.of(18e-9, Quantity.INDUCTANCE, "18 nH"),
                Arguments.of(0.3e-3, Quantity.RESISTANCE, "300 µΩ"),
                Arguments.of(150e6, Quantity.FREQUENCY, "150 MHz"),
                Arguments.of(0.95, Quantity.VOLTAGE, "950 mV"),
                Arguments.of(6.0, Quantity.CURRENT, "6 A"),
                Arguments.of(999.96, Quantity.FREQUENCY, "1 kHz"),
                Arguments.of(4.567e-6, Quantity.CAPACITANCE, "4.57 µF"),
                Arguments.of(0.4567e-9, Quantity.INDUCTANCE, "0.457 nH"),
                Arguments.of(0.0, Quantity.CAPACITANCE, "0 F"),
                Arguments.of(0.03, Quantity.FRACTION, "3 %"),
                Arguments.of(1.0, Quantity.FRACTION, "100 %"),
                Arguments.of(0.125, Quantity.FRACTION, "12.5 %"),
                Arguments.of(-2.2e-3, Quantity.VOLTAGE, "-2.2 mV"));
    }

    @ParameterizedTest(name = "{0} {1}")
    @MethodSource("formatted")
    void formatsWithSiPrefix(double value, Quantity quantity, String expected) {
        assertThat(EngineeringNotation.format(value, quantity)).isEqualTo(expected);
    }

    @Test
    void formatsWithAPointWhateverTheDefaultLocale() {
        // German writes 4,7; output must not follow the default locale (all output uses Locale.ROOT)
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            assertThat(EngineeringNotation.format(4.7e-6, Quantity.CAPACITANCE)).isEqualTo("4.7 µF");
            assertThat(EngineeringNotation.format(0.125, Quantity.FRACTION)).isEqualTo("12.5 %");
        } finally {
            Locale.setDefault(before);
        }
    }

    @Test
    void formattedTextReadsBackToTheSameValue() throws NotationException {
        // round trip: printing with 3 significant digits and reading back changes the value by less
        // than half a unit in the third digit (relative 5e-3)
        double[] values = {4.7e-6, 0.45e-9, 25e-12, 0.3e-3, 150e6, 1.234e-15, 0.03};
        Quantity[] quantities = {Quantity.CAPACITANCE, Quantity.INDUCTANCE, Quantity.INDUCTANCE,
                Quantity.RESISTANCE, Quantity.FREQUENCY, Quantity.CAPACITANCE, Quantity.FRACTION};
        for (int k = 0; k < values.length; k++) {
            String text = EngineeringNotation.format(values[k], quantities[k]);
            assertThat(EngineeringNotation.parse(text, quantities[k]))
                    .as(text)
                    .isCloseTo(values[k], within(Math.abs(values[k]) * 5e-3));
        }
    }
}
