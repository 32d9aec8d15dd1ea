package breakwater.design;

import breakwater.catalog.BankEntry;
import breakwater.catalog.Part;
import breakwater.scenario.Rail;

import java.util.List;
import java.util.Locale;

/**
 * Part voltage ratings against the rail (docs/file-contracts.md#part-ratings).
 *
 * <p>The voltage a part must be rated for is the rail's highest voltage: the nominal voltage plus its
 * tolerance, V_nom·(1 + tolerance). A bank that meets the spec keeps its worst overshoot inside that
 * limit by definition, so no bank the search may choose lets the rail rise higher; for a bank that is
 * only judged ({@code check}) and fails, its own worst V_max is used when it is higher. A part without a
 * {@code voltage_rating} is not refused (its rating is unknown, not low). Derating beyond the rating (for
 * temperature, DC bias, ripple current, reliability) is the part maker's data and local practice: it is
 * not applied here.
 */
public final class VoltageRatings {
    private VoltageRatings() {
    }

    /** V_nom·(1 + tolerance): the highest voltage of a rail whose bank meets the spec. */
    public static double highestRailVoltage(Rail rail) {
        return rail.voltageV() * (1 + rail.toleranceFraction());
    }

    /** Whether {@code p} may sit on a rail that reaches {@code highestV}: rated at least that, or unrated. */
    public static boolean ratedFor(Part p, double highestV) {
        return p.voltageRating().isEmpty() || p.voltageRating().getAsDouble() >= highestV;
    }

    /** The parts of {@code parts} rated for {@code highestV} (or unrated), in order. */
    public static List<Part> ratedFor(List<Part> parts, double highestV) {
        return parts.stream().filter(p -> ratedFor(p, highestV)).toList();
    }

    /** The parts of {@code parts} rated below {@code highestV}, as "NAME (6.3 V)", in order. */
    public static List<String> underrated(List<Part> parts, double highestV) {
        return parts.stream().filter(p -> !ratedFor(p, highestV))
                .map(p -> String.format(Locale.ROOT, "%s (%s V)", p.name(), trim(p.voltageRating().getAsDouble())))
                .toList();
    }

    /** The bank's parts rated below {@code highestV}. */
    public static List<String> underratedInBank(List<BankEntry> entries, double highestV) {
        return underrated(entries.stream().map(BankEntry::part).toList(), highestV);
    }

    static String trim(double v) {
        String s = String.format(Locale.ROOT, "%.4g", v);
        return s.contains(".") && !s.contains("e") ? s.replaceFirst("\\.?0+$", "") : s; // 1000 stays 1000
    }
}
