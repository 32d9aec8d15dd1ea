package breakwater.scenario;

import breakwater.diagnostic.Diagnostic;
import breakwater.units.EngineeringNotation;
import breakwater.units.Plausible;
import breakwater.units.Quantity;

import java.util.ArrayList;
import java.util.List;

/**
 * The scenario's values against the ranges real rails have ({@link Plausible},
 * docs/file-contracts.md#plausible-values): a value of the right sign but outside its range is refused
 * at its key, with the range. Run on a scenario already read (its own checks passed).
 */
public final class ScenarioRanges {
    private ScenarioRanges() {
    }

    /** Every value of {@code s} outside its range, located in the file by {@code places}; empty when none. */
    public static List<Diagnostic> refusals(Scenario s, ScenarioPlaces places) {
        List<Diagnostic> out = new ArrayList<>();
        Rail r = s.rail();
        check(out, places, List.of("rail", "voltage"), r.voltageV(), Plausible.RAIL_VOLTAGE);
        check(out, places, List.of("rail", "max_current"), r.maxCurrentA(), Plausible.CURRENT);
        check(out, places, List.of("rail", "edge_time"), r.edgeTimeS(), Plausible.EDGE);
        check(out, places, List.of("band", "from"), s.band().fromHz(), Plausible.FREQUENCY);
        check(out, places, List.of("band", "to"), s.band().toHz(), Plausible.FREQUENCY);
        check(out, places, List.of("regulator", "resistance"), s.regulator().resistanceOhms(), Plausible.PATH_RESISTANCE);
        check(out, places, List.of("regulator", "inductance"), s.regulator().inductanceH(), Plausible.PATH_INDUCTANCE);
        check(out, places, List.of("plane", "capacitance"), s.plane().capacitanceF(), Plausible.NODE_CAPACITANCE);
        check(out, places, List.of("plane", "resistance"), s.plane().resistanceOhms(), Plausible.PATH_RESISTANCE);
        check(out, places, List.of("package", "resistance"), s.packagePath().resistanceOhms(), Plausible.PATH_RESISTANCE);
        check(out, places, List.of("package", "inductance"), s.packagePath().inductanceH(), Plausible.PATH_INDUCTANCE);
        check(out, places, List.of("die", "capacitance"), s.die().capacitanceF(), Plausible.NODE_CAPACITANCE);
        check(out, places, List.of("die", "resistance"), s.die().resistanceOhms(), Plausible.PATH_RESISTANCE);
        check(out, places, List.of("cost", "placement"), s.cost().placementPerPart(), Plausible.PRICE);
        check(out, places, List.of("cost", "line_item"), s.cost().perLineItem(), Plausible.PRICE);
        for (Footprint f : s.footprints().values()) {
            f.mountInductanceByCaseH().forEach((code, l) -> check(out, places, List.of("footprint", f.name(), code), l,
                    Plausible.MOUNT));
        }
        return out;
    }

    /**
     * Edge times slower than this are warned about: such a load is slow enough that the regulator's
     * loop, which the model leaves out, answers much of it (common practice, from memory).
     */
    public static final double SLOW_EDGE_S = 100e-6;
    /**
     * Band edges below this are warned about: the regulator's control loop (commonly 10 to 100 kHz wide,
     * common practice, from memory) sets the impedance there, and the model has only its output R + sL.
     */
    public static final double LOW_BAND_HZ = 1e3;
    /**
     * Band edges above this are warned about: planes, vias and packages stop being lumped elements as
     * their dimensions approach a tenth of a wavelength (common practice, from memory).
     */
    public static final double HIGH_BAND_HZ = 1e9;

    /**
     * Values of {@code s} that are accepted but unusual, where the model's answer deserves a second look,
     * each located in the file by {@code places}; empty when none (docs/file-contracts.md#plausible-values).
     */
    public static List<Diagnostic> warnings(Scenario s, ScenarioPlaces places) {
        List<Diagnostic> out = new ArrayList<>();
        Rail r = s.rail();
        if (r.edgeTimeS() > SLOW_EDGE_S) {
            out.add(places.at(List.of("rail", "edge_time"), "rail.edge_time " + EngineeringNotation.format(r.edgeTimeS(),
                    Quantity.TIME) + " is slower than " + EngineeringNotation.format(SLOW_EDGE_S, Quantity.TIME)
                    + ": a load this slow is answered mostly by the regulator's control loop, which the model leaves "
                    + "out (it has the regulator's output R + sL only), so the droop may be optimistic"));
        }
        if (s.band().fromHz() < LOW_BAND_HZ) {
            out.add(places.at(List.of("band", "from"), "band.from " + EngineeringNotation.format(s.band().fromHz(),
                    Quantity.FREQUENCY) + " is below " + EngineeringNotation.format(LOW_BAND_HZ, Quantity.FREQUENCY)
                    + ": there the regulator's control loop, which the model leaves out, sets the impedance; judge "
                    + "that part of the band with the regulator's own data"));
        }
        if (s.band().toHz() > HIGH_BAND_HZ) {
            out.add(places.at(List.of("band", "to"), "band.to " + EngineeringNotation.format(s.band().toHz(),
                    Quantity.FREQUENCY) + " is above " + EngineeringNotation.format(HIGH_BAND_HZ, Quantity.FREQUENCY)
                    + ": there planes, vias and packages are no longer lumped elements, and the model's impedance "
                    + "says little; judge that part of the band with a field solver or measurements"));
        }
        return out;
    }

    private static void check(List<Diagnostic> out, ScenarioPlaces places, List<String> path, double v, Plausible p) {
        if (Double.isNaN(v) || v < 0 || p.accepts(v)) {
            return;
        }
        String written = p.q() == breakwater.units.Quantity.PLAIN ? Double.toString(v)
                : EngineeringNotation.format(v, p.q(), 4);
        out.add(places.at(path, p.refusal(String.join(".", path), written)));
    }
}
