package breakwater.report.export;

import breakwater.design.Evaluation;
import breakwater.scenario.Footprint;
import breakwater.scenario.Scenario;
import breakwater.timedomain.PoleResidueModel;
import breakwater.timedomain.Waveform;

import java.util.Objects;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * A judged bank on its rail, with what the exports need: the network and its pole–residue model, the
 * impedance curve of impedance.csv, the worst-case droop and overshoot waveforms, and the figures.
 *
 * @param scenario      the rail scenario
 * @param footprintName the footprint used, "" for the catalog's mounting inductances
 * @param footprint     its mounting inductances, empty for the catalog's
 * @param evaluation    the bank's verdict
 * @param droop         the worst-case droop pattern in time (the content of worst-case.csv)
 * @param overshoot     the worst-case overshoot pattern in time
 * @param version       the program's version for the file headers
 */
public record ExportedRail(Scenario scenario, String footprintName, Optional<Footprint> footprint,
                           Evaluation evaluation, Waveform droop, Waveform overshoot, String version) {

    public ExportedRail {
        Objects.requireNonNull(scenario, "scenario");
        Objects.requireNonNull(footprintName, "footprintName");
        Objects.requireNonNull(footprint, "footprint");
        Objects.requireNonNull(evaluation, "evaluation");
        Objects.requireNonNull(droop, "droop");
        Objects.requireNonNull(overshoot, "overshoot");
        Objects.requireNonNull(version, "version");
    }

    /** The program's version from the jar manifest, or "development build" when run from classes. */
    public static String programVersion() {
        return Optional.ofNullable(ExportedRail.class.getPackage().getImplementationVersion())
                .orElse("development build");
    }

    /** The rail's name, or the scenario file when it has none. */
    String railName() {
        return scenario.rail().name().isEmpty() ? scenario.source() : scenario.rail().name();
    }

    /** "8 x A, 2 x B (10 parts)". */
    String bankText() {
        var entries = evaluation.bank().entries();
        if (entries.isEmpty()) {
            return "no capacitors";
        }
        return entries.stream().map(e -> e.count() + " x " + e.part().name()).collect(Collectors.joining(", "))
                + " (" + evaluation.bank().totalParts() + " parts)";
    }

    String footprintText() {
        return footprintName.isEmpty() ? "the catalog's mounting inductances" : "footprint " + footprintName;
    }

    /** The fastest mode's natural period 2π/|p| over the model's poles, s. */
    double shortestPeriodS() {
        PoleResidueModel m = evaluation.model();
        double[] re = m.poleRe();
        double[] im = m.poleIm();
        double fastest = 0;
        for (int k = 0; k < re.length; k++) {
            fastest = Math.max(fastest, Math.hypot(re[k], im[k]));
        }
        if (!(fastest > 0)) {
            throw new IllegalStateException("the model has no pole");
        }
        return 2 * Math.PI / fastest;
    }

}
