package breakwater.cli;

import java.util.Locale;

/** Small text helpers shared by the mode commands. */
final class Text {
    private Text() {
    }

    /** Money with four decimals, as in the BOM: "2.0880". */
    static String money(double v) {
        return String.format(Locale.ROOT, "%.4f", v);
    }

    /** Money with the currency after it when there is one: "2.0880 USD". */
    static String money(double v, String currency) {
        return money(v) + (currency.isEmpty() ? "" : " " + currency);
    }
}
