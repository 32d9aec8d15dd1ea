package breakwater.design;

import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.InputException;
import breakwater.network.NetworkBuilder;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

import static breakwater.units.EngineeringNotation.format;
import static breakwater.units.Quantity.VOLTAGE;

/**
 * A design margin: the worst case must stay {@code marginV} inside the tolerance band on both sides, for
 * part spread and model error. The search judges against the band narrowed by it; the verdict still uses
 * the real limits, and the margin kept is the run's own condition.
 *
 * @param marginV      the margin, &gt; 0
 * @param source       where it was given, as the user wrote it: "--margin" or "solver.margin"
 * @param fromScenario whether it comes from the scenario file (then an impossible one is an input error
 *                     located in that file) rather than from the command line
 */
public record DesignMargin(double marginV, String source, boolean fromScenario) {
    /** The search judged the same worst case, to rounding: a nanovolt less still keeps the margin. */
    static final double KEPT_TOLERANCE_V = 1e-9;

    public DesignMargin {
        Objects.requireNonNull(source, "source");
        if (!(marginV > 0)) {
            throw new IllegalArgumentException("a design margin must be > 0 V, got " + marginV);
        }
    }

    /**
     * The judge the search uses: the tolerance band narrowed by the margin on both sides. No bank droops
     * less than ΔI·Z(0) (where its step response settles: final value theorem), so the droop side has that
     * much less room than the band; a margin of the whole room, or more, is refused, saying how much room
     * there is.
     *
     * @throws RequestRefused  for a margin from the command line that leaves no room
     * @throws InputException  for such a margin from the scenario file
     */
    public BankEvaluator narrow(BankEvaluator spec) throws InputException {
        Limits band = spec.limits();
        double op = spec.operatingPointV();
        double below = op - band.lowerV();
        double above = band.upperV() - op;
        double settle = spec.scenario().rail().currentStepA()
                * NetworkBuilder.build(spec.scenario(), List.of(), spec.footprint()).dcResistanceOhms();
        double room = Math.min(below - settle, above);
        if (!(marginV < room * (1 - 1e-9))) {
            String message = String.format(Locale.ROOT, "%s %s leaves no room: from the %s operating point the "
                            + "tolerance band allows %s of droop and %s of overshoot, and no bank droops less than "
                            + "ΔI·Z(0) = %s; choose a margin below %s", source,
                    format(marginV, VOLTAGE), format(op, VOLTAGE, 5), format(below, VOLTAGE), format(above, VOLTAGE),
                    format(settle, VOLTAGE), format(room, VOLTAGE));
            if (fromScenario) {
                throw new InputException(Diagnostic.of(spec.scenario().source(), message));
            }
            throw new RequestRefused(message);
        }
        return spec.withLimits(new Limits(band.lowerV() + marginV, band.upperV() - marginV));
    }

    /** What a bank, judged against the real limits, keeps of the margin. */
    public Kept kept(Evaluation e) {
        double kept = e.figures().marginV();
        return new Kept(this, kept, kept >= marginV - KEPT_TOLERANCE_V);
    }

    /**
     * @param asked   the margin asked for
     * @param keptV   the bank's margin to the real limits
     * @param met     whether it keeps the margin asked for
     */
    public record Kept(DesignMargin asked, double keptV, boolean met) {
        /** The run's condition when it is not met. */
        public Optional<Verdict.ModeCondition> failure() {
            return met ? Optional.empty() : Optional.of(new Verdict.MarginNotKept(keptV, asked.marginV(), asked.source()));
        }
    }
}
