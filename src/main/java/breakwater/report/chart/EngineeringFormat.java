package breakwater.report.chart;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.text.FieldPosition;
import java.text.NumberFormat;
import java.text.ParsePosition;

/**
 * Axis labels in engineering notation: a mantissa, an SI prefix (exponent a multiple of three) and a
 * unit, e.g. {@code 1e4 -> "10 kHz"}, {@code 0.1 -> "100 mΩ"}, {@code 5e-7 -> "0.5 µs"}.
 *
 * <p>Three modes:
 * <ul>
 *   <li>{@link #perValue(String)}: each value gets its own prefix (mantissa in [1, 1000), four
 *       significant digits, trailing zeros removed). Suits logarithmic axes, whose ticks span decades.</li>
 *   <li>{@link #forRange(String, double, double)}: one prefix for the whole axis, chosen so that the larger
 *       end of the range reads between 0.1 and 100, with enough decimals for the span. Suits linear axes:
 *       "0 µs, 0.5 µs, 1 µs", "0.92 V, 0.94 V".</li>
 *   <li>{@link #plain(String, double, double)}: no prefix at all, for money and other counts.</li>
 * </ul>
 * Prefixes run from f (10⁻¹⁵) to T (10¹²) as in the SI Brochure; outside that, scientific notation.
 * Negative numbers use the minus sign U+2212. Output is independent of the default locale.
 * Formatting only: {@link #parse(String, ParsePosition)} never succeeds.
 */
public final class EngineeringFormat extends NumberFormat {
    private static final String[] PREFIX = {"f", "p", "n", "µ", "m", "", "k", "M", "G", "T"};
    private static final int PREFIX_OFFSET = 5; // PREFIX[5] is 10^0
    private static final int PER_VALUE_DIGITS = 4;

    private final String unit;
    /** Exponent/3 used for every value, or Integer.MIN_VALUE for per-value prefixes. */
    private final int fixedExp3;
    /** Decimals of the mantissa in fixed mode. */
    private final int decimals;
    private final boolean usePrefix;

    private EngineeringFormat(String unit, int fixedExp3, int decimals, boolean usePrefix) {
        this.unit = unit;
        this.fixedExp3 = fixedExp3;
        this.decimals = decimals;
        this.usePrefix = usePrefix;
    }

    /** Each value with its own SI prefix; {@code unit} may be empty. */
    public static EngineeringFormat perValue(String unit) {
        return new EngineeringFormat(checkUnit(unit), Integer.MIN_VALUE, 0, true);
    }

    /** One SI prefix for an axis running from {@code lower} to {@code upper}. */
    public static EngineeringFormat forRange(String unit, double lower, double upper) {
        checkRange(lower, upper);
        double maxAbs = Math.max(Math.abs(lower), Math.abs(upper));
        // the prefix that puts the larger end in [0.1, 100): "0.98 V" rather than "980 mV", "1.6 µs", "25 mV"
        int exp3 = maxAbs == 0 ? 0 : clampExp3(Math.floorDiv((int) Math.floor(Math.log10(maxAbs) + 1 + 1e-9), 3));
        return new EngineeringFormat(checkUnit(unit), exp3, decimalsFor((upper - lower) / Math.pow(10, 3 * exp3)), true);
    }

    /**
     * One SI prefix for an axis from {@code lower} to {@code upper} that puts the larger end in [1, 1000):
     * "168.3 µs" and "20 µs" rather than "0.1683 ms". For time axes, whose titles and legends name
     * instants and windows with their own prefix ("the last 112 ns"), so that one chart uses one unit.
     */
    public static EngineeringFormat forRangeInWholeUnits(String unit, double lower, double upper) {
        checkRange(lower, upper);
        double maxAbs = Math.max(Math.abs(lower), Math.abs(upper));
        int exp3 = maxAbs == 0 ? 0 : clampExp3(Math.floorDiv((int) Math.floor(Math.log10(maxAbs) + 1e-9), 3));
        return new EngineeringFormat(checkUnit(unit), exp3, decimalsFor((upper - lower) / Math.pow(10, 3 * exp3)), true);
    }

    /** No prefix, decimals chosen for the span: {@code plain("USD", 0, 2)} gives "0.25 USD". */
    public static EngineeringFormat plain(String unit, double lower, double upper) {
        checkRange(lower, upper);
        return new EngineeringFormat(checkUnit(unit), 0, decimalsFor(upper - lower), false);
    }

    private static String checkUnit(String unit) {
        if (unit == null) {
            throw new IllegalArgumentException("unit is null; use \"\" for a plain number");
        }
        return unit;
    }

    private static void checkRange(double lower, double upper) {
        if (!Double.isFinite(lower) || !Double.isFinite(upper) || upper < lower) {
            throw new IllegalArgumentException("axis range " + lower + " .. " + upper
                    + " is not a finite, ordered range");
        }
    }

    /** Ticks are about a tenth of the span apart; three more decimals than the span's leading digit. */
    private static int decimalsFor(double span) {
        if (span <= 0 || !Double.isFinite(span)) {
            return 3;
        }
        int d = (int) Math.ceil(-Math.log10(span) - 1e-9) + 3;
        return Math.max(0, Math.min(12, d));
    }

    private static int clampExp3(int exp3) {
        return Math.max(-PREFIX_OFFSET, Math.min(PREFIX.length - 1 - PREFIX_OFFSET, exp3));
    }

    /** Formats one value; the convenience used by tests and by chart annotations. */
    public String text(double value) {
        if (!Double.isFinite(value)) {
            return Double.isNaN(value) ? "NaN" : (value > 0 ? "∞" : "−∞");
        }
        String number;
        String prefix;
        if (fixedExp3 == Integer.MIN_VALUE) {
            if (value == 0) {
                return withUnit("0", "");
            }
            int exp3 = Math.floorDiv((int) Math.floor(Math.log10(Math.abs(value))), 3);
            BigDecimal m = significant(value / Math.pow(10, 3 * exp3));
            if (m.abs().compareTo(BigDecimal.valueOf(1000)) >= 0) { // 999.99996 rounds up to the next prefix
                exp3++;
                m = significant(value / Math.pow(10, 3 * exp3));
            }
            if (exp3 != clampExp3(exp3)) {
                return withUnit(String.format(java.util.Locale.ROOT, "%.3e", value).replace('-', '−'), "");
            }
            number = plainText(m);
            prefix = PREFIX[exp3 + PREFIX_OFFSET];
        } else {
            BigDecimal m = BigDecimal.valueOf(value / Math.pow(10, 3 * fixedExp3)).setScale(decimals, RoundingMode.HALF_EVEN);
            number = plainText(m);
            prefix = usePrefix ? PREFIX[fixedExp3 + PREFIX_OFFSET] : "";
        }
        return withUnit(number, prefix);
    }

    private static BigDecimal significant(double mantissa) {
        return new BigDecimal(mantissa).round(new MathContext(PER_VALUE_DIGITS, RoundingMode.HALF_EVEN));
    }

    private static String plainText(BigDecimal m) {
        if (m.signum() == 0) {
            return "0"; // also turns -0.000 into 0
        }
        String s = m.stripTrailingZeros().toPlainString();
        return s.startsWith("-") ? "−" + s.substring(1) : s;
    }

    private String withUnit(String number, String prefix) {
        String u = prefix + unit;
        return u.isEmpty() ? number : number + " " + u;
    }

    @Override
    public StringBuffer format(double number, StringBuffer toAppendTo, FieldPosition pos) {
        return toAppendTo.append(text(number));
    }

    @Override
    public StringBuffer format(long number, StringBuffer toAppendTo, FieldPosition pos) {
        return toAppendTo.append(text(number));
    }

    /** Not supported: labels are for reading by people. Always fails, leaving {@code pos} unchanged. */
    @Override
    public Number parse(String source, ParsePosition parsePosition) {
        parsePosition.setErrorIndex(parsePosition.getIndex());
        return null;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof EngineeringFormat f && f.unit.equals(unit) && f.fixedExp3 == fixedExp3
                && f.decimals == decimals && f.usePrefix == usePrefix;
    }

    @Override
    public int hashCode() {
        return unit.hashCode() * 31 + fixedExp3 * 7 + decimals;
    }
}
