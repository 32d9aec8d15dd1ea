package breakwater.report;

import breakwater.design.Verdict;
import breakwater.network.AntiResonance;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import static breakwater.report.Figures.format;
import static breakwater.units.Quantity.FREQUENCY;
import static breakwater.units.Quantity.RESISTANCE;
import static breakwater.units.Quantity.VOLTAGE;

/** A {@link Verdict} in words: console lines and the report's verdict box. */
public final class Verdicts {
    /** The caution every console verdict ends with. */
    static final String MODEL_CAUTION = "A model is not a measurement: verify the design on hardware.";

    private Verdicts() {
    }

    /** One reason in words, e.g. "worst-case overshoot rises 44.8 mV above the upper limit". */
    public static String text(Verdict.Reason reason) {
        return switch (reason) {
            case Verdict.DroopBelowLimit d -> "worst-case droop falls " + format(d.excessV(), VOLTAGE)
                    + " below the lower limit" + d.largestAntiResonance()
                    .map(a -> " (largest anti-resonance: " + resonance(a, d.targetOhms()) + ")").orElse("");
            case Verdict.OvershootAboveLimit o -> "worst-case overshoot rises " + format(o.excessV(), VOLTAGE)
                    + " above the upper limit";
            case Verdict.BoardLimitBroken b -> "board limit " + b.violation().describe();
            case Verdict.OverTarget t -> String.format(Locale.ROOT,
                    "|Z| exceeds the target (objective.require_target): peak %.2f × target", t.peakOverTarget());
            case Verdict.MarginNotKept m -> String.format(Locale.ROOT, "the margin kept (%s) is less than the %s "
                    + "required by %s", format(m.keptV(), VOLTAGE), format(m.requiredV(), VOLTAGE), m.source());
            case Verdict.TrimLostMargin t -> "TRIM LOST MARGIN: the result is worse than the existing bank";
            case Verdict.FootprintsFailing f -> "NOT EVERY FOOTPRINT MEETS THE SPEC: " + String.join(", ", f.names())
                    + " do" + (f.names().size() == 1 ? "es" : "") + " not";
        };
    }

    /** An anti-resonance in words, e.g. "12.3 mΩ at 49.4 MHz, 1.14 × target, Q 1.1". */
    static String resonance(AntiResonance a, double targetOhms) {
        return format(a.impedanceOhms(), RESISTANCE) + " at " + format(a.frequencyHz(), FREQUENCY, 4)
                + String.format(Locale.ROOT, ", %.2f × target, Q %.1f", a.impedanceOhms() / targetOhms, a.q());
    }

    /** The caution in words, saying how to check or what to ask for. */
    public static String text(Verdict.Caution caution) {
        String margin = format(caution.marginV(), VOLTAGE);
        // a run that already asked for a margin is told to ask for more, not for one
        String ask = caution.marginAsked() ? "a larger design margin (--margin)" : "a design margin (solve --margin)";
        return switch (caution) {
            case Verdict.LowYield y -> String.format(Locale.ROOT, "Caution: the margin is %s, and with parts drawn "
                            + "within their tolerances only %.1f %% of the samples meet the spec (see the Monte Carlo "
                            + "figures): ask for %s or a flatter bank, and verify on hardware.", margin,
                    100 * y.yieldFraction(), ask);
            case Verdict.ThinMargin t -> String.format(Locale.ROOT, "Note: the margin (%s) is under 5 %% of the "
                    + "allowance; part tolerances can use it up. Check the yield with --monte-carlo 1000, ask for %s, "
                    + "and verify on hardware.", margin, ask);
        };
    }

    /**
     * The verdict for the console: the run's unmet conditions, the headline with one indented line per
     * reason, the model caution, and the margin caution when there is one.
     */
    public static String console(Verdict v) {
        StringBuilder b = new StringBuilder();
        for (Verdict.ModeCondition m : v.modeFailures()) {
            b.append(text(m)).append('\n');
        }
        if (v.meetsSpec()) {
            b.append("MEETS SPEC");
        } else if (v.bankMeetsSpec()) {
            // the bank shown meets the spec, but the run as a whole does not (see the lines above)
            b.append("The bank shown meets the spec; the run as a whole does not.");
        } else {
            b.append("DOES NOT MEET SPEC:");
            for (Verdict.Reason r : v.reasons()) {
                b.append("\n  ").append(text(r));
            }
        }
        b.append('\n').append(MODEL_CAUTION).append('\n');
        v.caution().ifPresent(c -> b.append(text(c)).append('\n'));
        return b.toString();
    }

    /** The report's verdict box; a pass with a caution is drawn as one (amber). */
    public static ReportModel.Verdict report(Verdict v) {
        if (v.meetsSpec()) {
            Optional<Verdict.Caution> c = v.caution();
            return c.isPresent()
                    ? new ReportModel.Verdict(true, "Meets the spec in the model, but with little to spare",
                    List.of(text(c.get())), true)
                    : new ReportModel.Verdict(true, "Meets the spec: the exact worst case stays inside the tolerance "
                    + "band", List.of());
        }
        if (v.bankMeetsSpec()) {
            return new ReportModel.Verdict(false, "Does not meet the spec as a whole",
                    v.modeFailures().stream().map(Verdicts::text).toList());
        }
        List<String> reasons = new ArrayList<>();
        for (Verdict.Reason r : v.reasons()) {
            reasons.add(text(r));
        }
        return new ReportModel.Verdict(false, "Does not meet the spec", reasons);
    }
}
