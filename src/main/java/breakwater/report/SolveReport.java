package breakwater.report;

import breakwater.design.DesignMargin;
import breakwater.design.ReachBound;
import breakwater.optimize.SolveResult;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import static breakwater.report.Figures.format;
import static breakwater.units.Quantity.FREQUENCY;
import static breakwater.units.Quantity.RESISTANCE;
import static breakwater.units.Quantity.VOLTAGE;

/**
 * Writes what {@code solve} found: the common output with the search, the Monte Carlo figures, and the
 * design margin asked for (summary keys, console line, report section).
 */
public final class SolveReport {
    private SolveReport() {
    }

    public static void write(SolveResult r, ResultWriter.Target target, PrintWriter out) throws IOException {
        ModeOutput mode = MonteCarloReport.output(r.monteCarlo()).plus(r.margin().map(SolveReport::margin)
                .orElse(ModeOutput.NONE)).plus(r.reach().map(SolveReport::reach).orElse(ModeOutput.NONE));
        ResultWriter.write(new ResultWriter.Shown("solve", r.footprintName(), r.judge(), r.evaluation(),
                Optional.of(r.search()), r.verdict()), mode, target, out);
    }

    /**
     * What the end of a search without a passing bank means: proven out of reach of every bank, or only
     * not reached in the time given (the bound of {@link ReachBound}).
     */
    static ModeOutput reach(SolveResult.Reach reach) {
        String words = reachWords(reach);
        ReportModel.Section section = ReportModel.Section.text("Why no bank meets the spec",
                Character.toUpperCase(words.charAt(0)) + words.substring(1)).asLead();
        return new ModeOutput(Texts.wrap("Reach      " + words, " ".repeat(11)).stripTrailing(), summary -> {
            var o = summary.putObject("reach");
            o.put("proven_out_of_reach", reach.provenOutOfReach());
            o.put("bound_computed", reach.bound().isPresent());
            reach.bound().ifPresent(b -> {
                o.put("frequency_hz", b.frequencyHz());
                SummaryJson.putNumber(o, "least_impedance_ohm", b.leastImpedanceOhms());
                SummaryJson.putNumber(o, "droop_at_least_v", b.droopAtLeastV());
                o.put("droop_allowed_v", b.allowedDroopV());
                SummaryJson.putNumber(o, "overshoot_at_least_v", b.overshootAtLeastV());
                o.put("overshoot_allowed_v", b.allowedOvershootV());
                o.put("by_target", b.byTarget());
            });
        }, List.of(section));
    }

    static String reachWords(SolveResult.Reach reach) {
        String tryMore = String.format(Locale.ROOT, "try a longer time limit (--time-limit %ds or more) or other "
                + "--seed values", Math.max(60, 4 * (long) Math.ceil(reach.seconds())));
        if (reach.bound().isEmpty()) {
            return String.format(Locale.ROOT, "no passing bank found in %.1f s. With placement regions no bound over "
                    + "every bank is computed, so this does not show that none exists: %s.", reach.seconds(), tryMore);
        }
        ReachBound b = reach.bound().get();
        String at = format(b.frequencyHz(), FREQUENCY);
        String z = format(b.leastImpedanceOhms(), RESISTANCE);
        if (b.outOfReach() && b.byTarget()) {
            return String.format(Locale.ROOT, "no bank of these parts within the board's limits can meet the spec: at %s "
                    + "every such bank has |Z| of at least %s at the load, above the required target %s. Change the "
                    + "rail, package or die, the board's limits or the catalog (or stop requiring the target).",
                    at, z, format(b.targetOhms(), RESISTANCE));
        }
        boolean droopSide = b.droopAtLeastV() / b.allowedDroopV() >= b.overshootAtLeastV() / b.allowedOvershootV();
        String side = droopSide ? "below" : "above";
        double least = droopSide ? b.droopAtLeastV() : b.overshootAtLeastV();
        double allowed = droopSide ? b.allowedDroopV() : b.allowedOvershootV();
        if (b.outOfReach()) {
            return String.format(Locale.ROOT, "no bank of these parts within the board's limits can meet the spec: at %s "
                    + "every such bank has |Z| of at least %s at the load, so a load switching at that rhythm swings "
                    + "at least %s %s the operating point, where %s is allowed. Change the rail, package or die, the "
                    + "board's limits or the catalog.", at, z, format(least, VOLTAGE), side, format(allowed, VOLTAGE));
        }
        return String.format(Locale.ROOT, "no passing bank found in %.1f s, but none is ruled out: the bound over every "
                + "bank within the board's limits (at least %s %s the operating point, at %s) stays inside the %s "
                + "allowed. A bank may exist: %s.", reach.seconds(), format(least, VOLTAGE), side, at,
                format(allowed, VOLTAGE), tryMore);
    }

    static ModeOutput margin(DesignMargin.Kept k) {
        String required = format(k.asked().marginV(), VOLTAGE);
        String source = k.asked().source();
        String kept = format(k.keptV(), VOLTAGE);
        String line = String.format(Locale.ROOT, "Margin     %s required inside the tolerance band (%s), %s kept: %s",
                required, source, kept, k.met() ? "met" : "NOT MET");
        ReportModel.Section section = ReportModel.Section.text("Required margin", String.format(Locale.ROOT,
                "The run asked for the worst-case droop and overshoot to stay at least %s inside the tolerance band "
                        + "(%s), as a design margin for part spread and model error. Margin kept: %s (%s).",
                required, source, kept, k.met() ? "met" : "not met"));
        return new ModeOutput(line, summary -> {
            summary.put("required_margin_v", k.asked().marginV());
            summary.put("required_margin_met", k.met());
        }, List.of(section));
    }
}
