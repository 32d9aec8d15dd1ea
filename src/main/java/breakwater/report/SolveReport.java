package breakwater.report;

import breakwater.design.DesignMargin;
import breakwater.optimize.SolveResult;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import static breakwater.report.Figures.format;
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
                .orElse(ModeOutput.NONE));
        ResultWriter.write(new ResultWriter.Shown("solve", r.footprintName(), r.judge(), r.evaluation(),
                Optional.of(r.search()), r.verdict()), mode, target, out);
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
