package breakwater.report;

import breakwater.design.CheckResult;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.Optional;

/** Writes what {@code check} found: the common output, with the Monte Carlo figures when there are any. */
public final class CheckReport {
    private CheckReport() {
    }

    public static void write(CheckResult r, ResultWriter.Target target, PrintWriter out) throws IOException {
        ResultWriter.write(new ResultWriter.Shown("check", r.footprintName(), r.judge(), r.evaluation(),
                Optional.empty(), r.verdict()), MonteCarloReport.output(r.monteCarlo()), target, out);
    }
}
