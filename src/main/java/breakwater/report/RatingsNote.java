package breakwater.report;

import breakwater.catalog.BankEntry;
import breakwater.catalog.Part;
import breakwater.design.Evaluation;
import breakwater.design.VoltageRatings;
import breakwater.scenario.Rail;
import breakwater.scenario.Scenario;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * What the part-rating check did, in words for the report's cautions and the console
 * (docs/file-contracts.md#part-ratings): the voltage each rating was held to (the rail's highest voltage,
 * nominal plus tolerance, which a bank that meets the spec keeps its worst overshoot inside), the
 * DC-bias retention applied at the rail voltage, and that derating is the part maker's and local
 * practice's to say. When the check was lifted ({@code --accept-low-rating}) it says so first and names
 * the bank's parts rated below that voltage.
 */
final class RatingsNote {
    private RatingsNote() {
    }

    /** The heading of the line that says the check was lifted, in capitals as the verdict words are. */
    static final String NOT_ENFORCED = "PART RATINGS NOT ENFORCED";

    /**
     * The line saying that {@code --accept-low-rating} lifted the check, naming the bank's under-rated
     * parts (or saying there is none).
     */
    static String notEnforced(Scenario s, Evaluation e) {
        double highest = VoltageRatings.highestRailVoltage(s.rail());
        List<String> low = VoltageRatings.underratedInBank(e.bank().entries(), highest);
        return NOT_ENFORCED + " (--accept-low-rating): parts rated below the rail's highest voltage " + volts(highest)
                + " were allowed; " + (low.isEmpty() ? "none of this bank's parts is rated below it"
                : "this bank holds " + String.join(", ", low) + ", rated below it: a part run above its rating can "
                + "fail short or lose its capacitance. Use parts rated for the rail before building this");
    }

    /**
     * The caution on what was checked, for a bank whose parts were held to their ratings (when no part of
     * the bank has a rating, it says that nothing was checked).
     */
    static String checked(Scenario s, Evaluation e) {
        Rail r = s.rail();
        double highest = VoltageRatings.highestRailVoltage(r);
        List<String> rated = new ArrayList<>();
        List<String> unrated = new ArrayList<>();
        List<String> retained = new ArrayList<>();
        for (BankEntry b : e.bank().entries()) {
            Part p = b.part();
            if (p.voltageRating().isPresent()) {
                rated.add(p.name() + " " + plain(p.voltageRating().getAsDouble()) + " V");
            } else {
                unrated.add(p.name());
            }
            if (p.dcBiasRetention() < 1) {
                retained.add(p.name() + " " + String.format(Locale.ROOT, "%.0f %%", 100 * p.dcBiasRetention()));
            }
        }
        StringBuilder b = new StringBuilder("Part ratings: ");
        if (rated.isEmpty()) {
            b.append("no part of this bank has a voltage_rating in the catalog, so no rating was checked");
        } else {
            double vMax = e.figures().maxVoltageV();
            b.append("each part's voltage_rating was checked against the rail's highest voltage, ")
                    .append(volts(highest)).append(" (nominal ").append(volts(r.voltageV())).append(" plus its ")
                    .append(plain(100 * r.toleranceFraction())).append(" %")
                    .append(" tolerance; a bank that meets the spec keeps its worst overshoot inside it, and this bank's "
                            + "worst case reaches ").append(volts(vMax)).append(vMax > highest
                            ? ", above it: the ratings must hold that too" : "").append("): ")
                    .append(String.join(", ", rated));
            if (!unrated.isEmpty()) {
                b.append("; not checked, no rating given: ").append(String.join(", ", unrated));
            }
        }
        b.append(". Capacitance is the catalog's value times its dc_bias_retention, the share assumed kept at the "
                + "rail's DC voltage of ").append(volts(r.voltageV()));
        b.append(retained.isEmpty() ? " (1 for every part of this bank)" : " (" + String.join(", ", retained) + ")");
        b.append(". This is the bare rating only: derating for temperature, DC bias, ripple current and reliability "
                + "follows the part maker's data and your local practice, which this tool does not know.");
        return b.toString();
    }

    /** Four significant digits without trailing zeros after the point: 10, 6.3, 1000, 2.5. */
    static String plain(double v) {
        String s = String.format(Locale.ROOT, "%.4g", v);
        return s.contains(".") && !s.contains("e") ? s.replaceFirst("\\.?0+$", "") : s;
    }

    private static String volts(double v) {
        return String.format(Locale.ROOT, "%.4g V", v);
    }
}
