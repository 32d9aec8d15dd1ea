package breakwater.report;

import breakwater.design.WorstCaseVolts;
import breakwater.optimize.CostDown;

import java.time.Duration;
import java.util.Locale;

import static breakwater.report.Figures.format;
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

    /** The console's width: the COLUMNS environment variable when it holds a sensible number, else 100. */
    static int width() {
        String c = System.getenv("COLUMNS");
        try {
            int w = c == null ? 100 : Integer.parseInt(c.strip());
            return w >= 40 && w <= 1000 ? w : 100;
        } catch (NumberFormatException e) {
            return 100;
        }
    }

    /**
     * {@code text} (its own indentation kept on the first line) wrapped at spaces to the console's
     * width, later lines starting with {@code indent}; ends with a newline.
     */
    static String wrap(String text, String indent) {
        return wrap(text, indent, width());
    }

    /** Each line of {@code text} (newline-separated) wrapped as {@link #wrap(String, String)}. */
    static String wrapLines(String text, String indent) {
        StringBuilder b = new StringBuilder();
        for (String l : text.split("\n")) {
            b.append(wrap(l, indent));
        }
        return b.toString();
    }

    static String wrap(String text, String indent, int width) {
        StringBuilder out = new StringBuilder();
        String rest = text;
        int floor = indent.length() + 1; // never break inside the head or the indentation
        while (rest.length() > width) {
            int cut = rest.lastIndexOf(' ', width);
            // never part a figure from its unit ("100 µs", "27.0 mV") or an operator from what follows
            while (cut > floor && (rest.charAt(cut - 1) == ' ' || keepsWithNext(rest, cut))) {
                cut = rest.lastIndexOf(' ', cut - 1);
            }
            if (cut <= floor) {
                cut = rest.indexOf(' ', width); // one long word: break after it
                if (cut < 0) {
                    break;
                }
            }
            out.append(rest, 0, cut).append('\n');
            rest = indent + rest.substring(cut).stripLeading();
        }
        return out.append(rest).append('\n').toString();
    }

    /** Whether the space at {@code cut} joins a number to the word after it, or a range's ".." to either side. */
    private static boolean keepsWithNext(String text, int cut) {
        char before = text.charAt(cut - 1);
        return Character.isDigit(before) || text.startsWith("..", cut - 2) || text.startsWith(" ..", cut);
    }

    /** "" for one, "s" for any other count. */
    static String plural(long n) {
        return n == 1 ? "" : "s";
    }
}
