package breakwater.report;

import breakwater.units.EngineeringNotation;
import breakwater.units.Quantity;

/**
 * Figures in the console and the report with a fixed number of significant digits: voltages and
 * impedances keep their trailing zeros ("29.0 mV" beside "28.1 mV", "1.30 mΩ"), so a column or a
 * sentence reads at one precision. Other quantities (frequencies, currents, times, fractions) mostly
 * echo the user's own inputs and print as {@link EngineeringNotation#format(double, Quantity, int)}
 * does, trailing zeros removed ("10 kHz", "2.5 A").
 */
final class Figures {
    private Figures() {
    }

    /** Three significant digits. */
    static String format(double value, Quantity quantity) {
        return format(value, quantity, 3);
    }

    /** {@code digits} significant digits, trailing zeros kept for voltages and impedances. */
    static String format(double value, Quantity quantity, int digits) {
        String text = EngineeringNotation.format(value, quantity, digits);
        if (quantity != Quantity.VOLTAGE && quantity != Quantity.RESISTANCE || value == 0 || !Double.isFinite(value)) {
            return text;
        }
        int space = text.indexOf(' ');
        String number = space < 0 ? text : text.substring(0, space);
        String rest = space < 0 ? "" : text.substring(space);
        if (!number.matches("[-−]?[0-9]+(\\.[0-9]+)?")) {
            return text; // an exponent form: leave it as it is
        }
        int significant = 0;
        boolean leading = true;
        for (char c : number.toCharArray()) {
            if (Character.isDigit(c)) {
                if (c != '0') {
                    leading = false;
                }
                if (!leading) {
                    significant++;
                }
            }
        }
        if (significant >= digits) {
            return text;
        }
        StringBuilder b = new StringBuilder(number);
        if (number.indexOf('.') < 0) {
            b.append('.');
        }
        b.append("0".repeat(digits - significant));
        return b + rest;
    }
}
