package breakwater.design;

import breakwater.scenario.Rail;

/**
 * The voltage band the worst case must stay in: the rail's V_nom·(1 ± tolerance), or a narrower band
 * (cost-down without losing margin, or a given excursion limit).
 */
public record Limits(double lowerV, double upperV) {
    public Limits {
        if (!(upperV > lowerV)) {
            throw new IllegalArgumentException("limits need lower < upper, got " + lowerV + " .. " + upperV);
        }
    }

    public static Limits of(Rail rail) {
        return new Limits(rail.lowerLimitV(), rail.upperLimitV());
    }

    /** The band where both hold. */
    public Limits intersect(Limits other) {
        return new Limits(Math.max(lowerV, other.lowerV), Math.min(upperV, other.upperV));
    }

    /** A band that allows at most {@code droopV} below and {@code overshootV} above {@code operatingV}. */
    public static Limits around(double operatingV, double droopV, double overshootV) {
        return new Limits(operatingV - droopV, operatingV + overshootV);
    }
}
