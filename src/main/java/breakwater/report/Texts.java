package breakwater.report;

import breakwater.design.WorstCaseVolts;
import breakwater.optimize.CostDown;

import java.time.Duration;
import java.util.Locale;

import static breakwater.units.EngineeringNotation.format;
import static breakwater.units.Quantity.VOLTAGE;

/** Small text helpers shared by the reporters. */
final class Texts {
    private Texts() {
    }

    /** Money with four decimals, as in the BOM: "2.0880". */
    static String money(double v) {
        return String.format(Locale.ROOT, "%.4f", v);
    }

    /** " USD", or "" when the catalog names no currency. */
    static String currency(String currency) {
        return currency.isEmpty() ? "" : " " + currency;
    }

    /** A time limit in words: "30 s", "6.666 s", "2.500 min". */
    static String duration(Duration d) {
        double s = d.toNanos() / 1e9;
        if (s >= 120) {
            return String.format(Locale.ROOT, "%.4g min", s / 60);
        }
        return String.format(Locale.ROOT, "%.4g s", s);
    }

    /**
     * The keep rule a trim applied, in the one wording every output uses after "keeping ": stderr,
     * the console, the report (and summary.json's {@code trim.keep} names it).
     */
    static String keepRule(CostDown.Keep rule, WorstCaseVolts existing) {
        if (rule == CostDown.Keep.MARGIN) {
            return "the existing bank's worst droop " + format(existing.droopV(), VOLTAGE) + " and worst overshoot "
                    + format(existing.overshootV(), VOLTAGE)
                    + " or better";
        }
        return existing.passes() ? "the spec"
                : "the spec (the existing bank itself misses it, so it has no margin to keep)";
    }

    /** "" for one, "s" for any other count. */
    static String plural(long n) {
        return n == 1 ? "" : "s";
    }
}
