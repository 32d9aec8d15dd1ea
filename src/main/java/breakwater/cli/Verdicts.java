package breakwater.cli;

import breakwater.design.BoardCheck;
import breakwater.design.Evaluation;
import breakwater.scenario.Scenario;

import java.util.Locale;

/** Whether a bank meets the scenario's spec, and why not, in words. */
final class Verdicts {
    private Verdicts() {
    }

    static boolean meetsSpec(Scenario s, Evaluation e) {
        return e.fitsBoard() && (!s.requireTarget() || e.impedance().underTarget());
    }

    static String describe(Scenario s, Evaluation e) {
        StringBuilder b = new StringBuilder();
        if (meetsSpec(s, e)) {
            b.append("MEETS SPEC");
        } else {
            b.append("DOES NOT MEET SPEC:");
            for (BoardCheck.Violation v : e.board()) {
                b.append("\n  board limit ").append(v.describe());
            }
            if (s.requireTarget() && !e.impedance().underTarget()) {
                b.append(String.format(Locale.ROOT, "%n  |Z| exceeds the target (objective.require_target): peak %.2f × target",
                        e.impedance().peakOverTarget()));
            }
        }
        b.append("\nA model is not a measurement: verify the design on hardware.");
        return b.toString();
    }
}
