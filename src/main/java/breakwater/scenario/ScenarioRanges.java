package breakwater.scenario;

import breakwater.diagnostic.Diagnostic;
import breakwater.units.EngineeringNotation;
import breakwater.units.Plausible;

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

    private static void check(List<Diagnostic> out, ScenarioPlaces places, List<String> path, double v, Plausible p) {
        if (Double.isNaN(v) || v < 0 || p.accepts(v)) {
            return;
        }
        String written = p.q() == breakwater.units.Quantity.PLAIN ? Double.toString(v)
                : EngineeringNotation.format(v, p.q(), 4);
        out.add(places.at(path, p.refusal(String.join(".", path), written)));
    }
}
