package breakwater.report;

import breakwater.design.BoardCheck;
import breakwater.design.Evaluation;
import breakwater.scenario.Scenario;

import breakwater.network.AntiResonance;

import java.util.Comparator;
import java.util.Locale;
import java.util.Optional;

import static breakwater.units.EngineeringNotation.format;
import static breakwater.units.Quantity.FREQUENCY;
import static breakwater.units.Quantity.RESISTANCE;
import static breakwater.units.Quantity.VOLTAGE;

/** Whether a bank meets the scenario's spec, and why not, in words. */
public final class Verdicts {
    private Verdicts() {
    }

    public static boolean meetsSpec(Scenario s, Evaluation e) {
        return e.figures().passes() && e.fitsBoard() && (!s.requireTarget() || e.impedance().underTarget());
    }

    /** The anti-resonance with the highest |Z|, in words, e.g. "12.3 mΩ at 49.4 MHz, Q 1.1". */
    public static Optional<String> worstResonance(Evaluation e) {
        return e.impedance().antiResonances().stream().max(Comparator.comparingDouble(AntiResonance::impedanceOhms))
                .map(a -> format(a.impedanceOhms(), RESISTANCE) + " at " + format(a.frequencyHz(), FREQUENCY, 4)
                        + String.format(Locale.ROOT, ", %.2f × target, Q %.1f", a.impedanceOhms() / e.impedance().targetOhms(), a.q()));
    }

    /** Why the bank does not meet the spec, one line per reason (empty when it does). */
    public static java.util.List<String> reasons(Scenario s, Evaluation e) {
        java.util.List<String> out = new java.util.ArrayList<>();
        var wc = e.figures();
        if (wc.droopExcessV() > 0) {
            out.add("worst-case droop falls " + format(wc.droopExcessV(), VOLTAGE) + " below the lower limit"
                    + worstResonance(e).map(a -> " (largest anti-resonance: " + a + ")").orElse(""));
        }
        if (wc.overshootExcessV() > 0) {
            out.add("worst-case overshoot rises " + format(wc.overshootExcessV(), VOLTAGE) + " above the upper limit");
        }
        for (BoardCheck.Violation v : e.board()) {
            out.add("board limit " + v.describe());
        }
        if (s.requireTarget() && !e.impedance().underTarget()) {
            out.add(String.format(Locale.ROOT, "|Z| exceeds the target (objective.require_target): peak %.2f × target",
                    e.impedance().peakOverTarget()));
        }
        return out;
    }

    /** The verdict in words for the console: the headline, one indented line per reason, the caution. */
    public static String describe(Scenario s, Evaluation e) {
        StringBuilder b = new StringBuilder(meetsSpec(s, e) ? "MEETS SPEC" : "DOES NOT MEET SPEC:");
        if (!meetsSpec(s, e)) {
            for (String r : reasons(s, e)) {
                b.append("\n  ").append(r);
            }
        }
        b.append("\nA model is not a measurement: verify the design on hardware.");
        return b.toString();
    }
}
