package breakwater.units;

import java.util.Locale;
import java.util.Map;

/**
 * Reads and writes numbers the way engineers write them.
 *
 * <p>Accepted on input, with optional spaces between number, prefix and unit:
 * <ul>
 *   <li>plain and exponent forms: {@code 0.1}, {@code 2.2e-6}, {@code 1E3};</li>
 *   <li>SI prefixes f p n u µ m k M G, optionally followed by the quantity's unit symbol:
 *       {@code 100n}, {@code 100nF}, {@code 0.5 mOhm}, {@code 0.5mΩ}, {@code 150 MHz};</li>
 *   <li>IEC 60062 notation, where the prefix (or R for the unit) stands in place of the decimal point:
 *       {@code 4u7} = 4.7 µ, {@code 2m2} = 2.2 m, {@code R47} = 0.47, {@code 4R7} = 4.7, {@code 1k5} = 1500;</li>
 *   <li>percentages for fractions: {@code 3 %} = 0.03. A plain number for a fraction is a ratio.</li>
 * </ul>
 * A unit symbol that belongs to another quantity (a value in H for a capacitance) is an error.
 * Output always uses {@link Locale#ROOT}.
 */
public final class EngineeringNotation {

    private static final Map<Character, Double> PREFIXES = Map.ofEntries(
            Map.entry('f', 1e-15), Map.entry('p', 1e-12), Map.entry('n', 1e-9),
            Map.entry('u', 1e-6), Map.entry('µ', 1e-6), Map.entry('μ', 1e-6),
            Map.entry('m', 1e-3), Map.entry('k', 1e3), Map.entry('K', 1e3),
            Map.entry('M', 1e6), Map.entry('G', 1e9));

    private static final String[] OUT_PREFIX = {"f", "p", "n", "µ", "m", "", "k", "M", "G"};

    /** The longest value read, in characters: a number with its unit never needs more. */
    public static final int MAX_LENGTH = 64;

    private EngineeringNotation() {
    }

    /**
     * Parses {@code text} as a value of {@code quantity}, returned in SI units.
     *
     * @throws NotationException with a message fit to follow "file:line:column: " in a diagnostic
     */
    public static double parse(String text, Quantity quantity) throws NotationException {
        if (text == null || text.isBlank()) {
            throw new NotationException("empty value where " + withArticle(quantity) + " is expected");
        }
        String s = text.strip();
        if (s.length() > MAX_LENGTH) {
            throw new NotationException("a value of " + s.length() + " characters ('" + s.substring(0, 24)
                    + "...'), longer than any number with its unit (at most " + MAX_LENGTH + ")");
        }
        double value = parseInner(s, quantity);
        if (!Double.isFinite(value)) {
            throw new NotationException("'" + text + "' is not a finite number");
        }
        return value;
    }

    private static double parseInner(String s, Quantity quantity) throws NotationException {
        // 1. Split off the leading numeric part: sign, digits, point, exponent.
        int i = 0;
        int n = s.length();
        if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
            i++;
        }
        int digitsStart = i;
        while (i < n && (Character.isDigit(s.charAt(i)) || s.charAt(i) == '.')) {
            i++;
        }
        // IEC 60062: digits, a prefix letter or R in place of the decimal point, digits
        // (4u7, 2m2, R47, 4R7, 1k5, n47); the whole part may be absent, the fraction may not
        if (i < n) {
            char c = s.charAt(i);
            boolean iecLetter = PREFIXES.containsKey(c) || c == 'R';
            if (iecLetter && s.substring(digitsStart, i).indexOf('.') < 0) {
                int j = i + 1;
                while (j < n && Character.isDigit(s.charAt(j))) {
                    j++;
                }
                boolean hasFraction = j > i + 1;
                boolean hasWhole = i > digitsStart;
                if (hasFraction) {
                    String whole = hasWhole ? s.substring(digitsStart, i) : "0";
                    String frac = s.substring(i + 1, j);
                    double mantissa = Double.parseDouble(whole + "." + frac);
                    double scale = c == 'R' ? 1.0 : PREFIXES.get(c);
                    if (c == 'R' && quantity != Quantity.RESISTANCE) {
                        throw new NotationException("'" + s + "': the R form of IEC 60062 is for resistance, not "
                                + quantity.description());
                    }
                    if (quantity == Quantity.FRACTION) {
                        throw new NotationException("'" + s + "': a fraction takes no SI prefix; write e.g. 3 % or 0.03");
                    }
                    String unit = s.substring(j).strip();
                    checkUnit(s, unit, quantity);
                    double sign = s.charAt(0) == '-' ? -1 : 1;
                    return sign * mantissa * scale;
                }
            }
        }
        if (i < n && (s.charAt(i) == 'e' || s.charAt(i) == 'E') && i > digitsStart) {
            int j = i + 1;
            if (j < n && (s.charAt(j) == '+' || s.charAt(j) == '-')) {
                j++;
            }
            int expDigits = j;
            while (j < n && Character.isDigit(s.charAt(j))) {
                j++;
            }
            if (j > expDigits) {
                i = j;
            }
        }
        String number = s.substring(0, i);
        if (i == digitsStart || number.equals(".") || number.endsWith("+") || number.endsWith("-")) {
            throw new NotationException("'" + s + "' does not start with a number");
        }
        double mantissa;
        try {
            mantissa = Double.parseDouble(number);
        } catch (NumberFormatException e) {
            throw new NotationException("'" + s + "' is not a number");
        }
        String rest = s.substring(i).strip();
        if (rest.isEmpty()) {
            return mantissa;
        }
        if (rest.equals("%")) {
            if (quantity != Quantity.FRACTION) {
                throw new NotationException("'" + s + "': a percentage is not " + withArticle(quantity)
                        + ", only fractions such as a tolerance take %");
            }
            return mantissa / 100.0;
        }
        // 2. Optional prefix, then optional unit symbol.
        if (quantity.acceptedSymbols().contains(rest)) {
            return mantissa;
        }
        char first = rest.charAt(0);
        if (PREFIXES.containsKey(first)) {
            String unit = rest.substring(1).strip();
            // "m" alone for a time is milli; "M" vs "m" are distinct (mega, milli)
            checkUnit(s, unit, quantity);
            if (quantity == Quantity.FRACTION) {
                throw new NotationException("'" + s + "': a fraction takes no SI prefix; write e.g. 3 % or 0.03");
            }
            return mantissa * PREFIXES.get(first);
        }
        checkUnit(s, rest, quantity);
        return mantissa; // unreachable: checkUnit throws for anything not accepted
    }

    private static void checkUnit(String whole, String unit, Quantity quantity) throws NotationException {
        if (unit.isEmpty() || quantity.acceptedSymbols().contains(unit)) {
            return;
        }
        for (Quantity other : Quantity.values()) {
            if (other != quantity && other.acceptedSymbols().contains(unit)) {
                throw new NotationException("'" + whole + "' is " + withArticle(other) + " (" + unit
                        + "), but " + withArticle(quantity) + " is expected"
                        + (quantity.symbol().isEmpty() ? "" : " (" + quantity.symbol() + ")"));
            }
        }
        if (unit.startsWith(",")) {
            throw new NotationException("'" + whole + "': a comma is not a decimal separator, numbers use a point"
                    + " (write " + whole.replace(',', '.') + ")");
        }
        throw new NotationException("'" + whole + "': unknown unit or prefix '" + unit + "'"
                + (quantity.symbol().isEmpty()
                ? "; " + withArticle(quantity) + " takes no unit, only an SI prefix f p n u µ m k M G"
                : "; " + withArticle(quantity) + " takes " + String.join(", ", quantity.acceptedSymbols())
                + " with an optional SI prefix f p n u µ m k M G"));
    }

    private static String withArticle(Quantity quantity) {
        String d = quantity.description();
        return ("aeiou".indexOf(d.charAt(0)) >= 0 ? "an " : "a ") + d;
    }

    /** Formats with 3 significant digits and an SI prefix: {@code 4.7e-6, CAPACITANCE} gives "4.7 µF". */
    public static String format(double value, Quantity quantity) {
        return format(value, quantity, 3);
    }

    /**
     * Formats {@code value} with {@code digits} significant digits, an SI prefix chosen so the mantissa
     * lies in [1, 1000), trailing zeros removed, and the quantity's symbol. Fractions print as percent.
     *
     * <p>One exception: inductances from 0.1 nH up to 1 nH print in nH ({@code 0.45 nH}, not
     * {@code 450 pH}), the way part ESL and mounting inductance are usually quoted (common practice).
     */
    public static String format(double value, Quantity quantity, int digits) {
        if (digits < 1) {
            throw new IllegalArgumentException("digits must be >= 1, got " + digits);
        }
        if (quantity == Quantity.FRACTION) {
            if (!Double.isFinite(value)) {
                return value + " %";
            }
            double percent = value * 100.0;
            return (percent == 0.0 ? "0" : roundSignificant(percent, digits)) + " %";
        }
        if (value == 0.0 || !Double.isFinite(value)) {
            return (value == 0.0 ? "0" : String.valueOf(value)) + (quantity.symbol().isEmpty() ? "" : " " + quantity.symbol());
        }
        double abs = Math.abs(value);
        int exp3 = (int) Math.floor(Math.log10(abs) / 3.0);
        if (quantity == Quantity.INDUCTANCE && exp3 == -4 && abs >= 1e-10 * (1 - 1e-12)) {
            exp3 = -3;
        }
        // rounding can push the mantissa to 1000 (999.96 -> 1000): recompute after rounding
        double mantissa = value / Math.pow(10, 3 * exp3);
        String text = roundSignificant(mantissa, digits);
        if (Math.abs(Double.parseDouble(text)) >= 1000.0) {
            exp3++;
            mantissa = value / Math.pow(10, 3 * exp3);
            text = roundSignificant(mantissa, digits);
        }
        int idx = exp3 + 5;
        if (idx < 0 || idx >= OUT_PREFIX.length) {
            return String.format(Locale.ROOT, "%." + (digits - 1) + "e", value)
                    + (quantity.symbol().isEmpty() ? "" : " " + quantity.symbol());
        }
        String unit = OUT_PREFIX[idx] + quantity.symbol();
        return text + (unit.isEmpty() ? "" : " " + unit);
    }

    private static String roundSignificant(double mantissa, int digits) {
        double abs = Math.abs(mantissa);
        // digits before the point; 0 for mantissas in [0.1, 1), so 0.456 keeps three significant digits
        int intDigits = abs == 0 ? 1 : (int) Math.floor(Math.log10(abs)) + 1;
        int decimals = Math.max(0, digits - intDigits);
        return trim(String.format(Locale.ROOT, "%." + decimals + "f", mantissa));
    }

    private static String trim(String s) {
        if (s.contains("e") || s.contains("E")) {
            return s;
        }
        if (s.indexOf('.') >= 0) {
            s = s.replaceAll("0+$", "");
            if (s.endsWith(".")) {
                s = s.substring(0, s.length() - 1);
            }
        }
        return s.equals("-0") || s.matches("-0\\.?0*") ? "0" : s;
    }
}
