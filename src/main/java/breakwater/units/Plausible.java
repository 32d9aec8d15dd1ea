package breakwater.units;

import java.util.Locale;

/**
 * The ranges of values a real part or rail has (docs/file-contracts.md#plausible-values). A value outside
 * its range is refused where it is written, with the range: such a value is a typing slip (a unit
 * prefix lost or doubled) far more often than a design, and the model's numbers would mislead.
 *
 * <p>The bounds are deliberately generous orders of magnitude from common practice, written from memory:
 * they refuse what no careful engineer would accept, not what is merely unusual.
 *
 * @param what   the quantity in words, for messages
 * @param min    the smallest value accepted (inclusive)
 * @param max    the largest value accepted (inclusive)
 * @param zeroOk whether exactly 0 is accepted as well (an ideal element: no resistance, no inductance)
 * @param q      its quantity, for printing the bounds
 */
public record Plausible(String what, double min, double max, boolean zeroOk, Quantity q) {
    /** Capacitance of one part: 0.1 pF (a small C0G) to 10 F (a large bulk or double-layer part). */
    public static final Plausible CAPACITANCE = new Plausible("a capacitance", 0.1e-12, 10, false, Quantity.CAPACITANCE);
    /** ESR: 10 µΩ (a large polymer part) to 100 Ω; 0 for an ideal part. */
    public static final Plausible ESR = new Plausible("an ESR", 10e-6, 100, true, Quantity.RESISTANCE);
    /** ESL: 1 pH (below any real package) to 100 nH (a leaded bulk part). */
    public static final Plausible ESL = new Plausible("an ESL", 1e-12, 100e-9, false, Quantity.INDUCTANCE);
    /** Mounting inductance: 1 pH to 100 nH; 0 for none. */
    public static final Plausible MOUNT = new Plausible("a mounting inductance", 1e-12, 100e-9, true, Quantity.INDUCTANCE);
    /** Rated voltage: 0.1 V to 10 kV. */
    public static final Plausible RATING = new Plausible("a rated voltage", 0.1, 10e3, false, Quantity.VOLTAGE);
    /** A price (per part, per placement, per line item): up to 10,000 in any currency. */
    public static final Plausible PRICE = new Plausible("a price", 0, 10e3, true, Quantity.PLAIN);
    /** Rail voltage: 0.1 V (below any logic core) to 1 kV. */
    public static final Plausible RAIL_VOLTAGE = new Plausible("a rail voltage", 0.1, 1e3, false, Quantity.VOLTAGE);
    /** Load current: 1 µA to 10 kA. */
    public static final Plausible CURRENT = new Plausible("a load current", 1e-6, 10e3, false, Quantity.CURRENT);
    /**
     * Edge time of the load: 1 ps to 1 ms; 0 for an ideal step. A load that slews more slowly than 1 ms is
     * held by the regulator's loop, not by decoupling capacitors.
     */
    public static final Plausible EDGE = new Plausible("an edge time", 1e-12, 1e-3, true, Quantity.TIME);
    /** Band edge: 1 Hz to 100 GHz. */
    public static final Plausible FREQUENCY = new Plausible("a band edge", 1, 100e9, false, Quantity.FREQUENCY);
    /** Series resistance of the regulator, plane, package or die: up to 10 Ω. */
    public static final Plausible PATH_RESISTANCE = new Plausible("a path resistance", 1e-9, 10, true, Quantity.RESISTANCE);
    /** Series inductance of the regulator or package: up to 1 mH. */
    public static final Plausible PATH_INDUCTANCE = new Plausible("a path inductance", 1e-15, 1e-3, true, Quantity.INDUCTANCE);
    /** Plane or on-die capacitance: up to 1 mF. */
    public static final Plausible NODE_CAPACITANCE = new Plausible("a plane or on-die capacitance", 1e-15, 1e-3, true,
            Quantity.CAPACITANCE);

    /** Whether {@code v} lies in the range (NaN, an absent value, is left to the caller). */
    public boolean accepts(double v) {
        return Double.isNaN(v) || (zeroOk && v == 0) || (v >= min && v <= max);
    }

    /** "from 0.1 pF to 10 F", "0, or from 10 µΩ to 100 Ω". */
    public String range() {
        String span = "from " + show(min) + " to " + show(max);
        return zeroOk && min > 0 ? "0, or " + span : span;
    }

    /** The message for a value outside the range: "'1e30' is not a plausible capacitance (… accepted)". */
    public String refusal(String key, String written) {
        return key + " '" + written + "' is outside the range of " + what + " (" + range()
                + " accepted: far outside what real parts and rails have, most likely a unit slip)";
    }

    private String show(double v) {
        return q == Quantity.PLAIN ? String.format(Locale.ROOT, "%s", v == Math.rint(v) ? Long.toString((long) v)
                : Double.toString(v)) : EngineeringNotation.format(v, q);
    }
}
