package breakwater.bench;

import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.options.Options;
import org.openjdk.jmh.runner.options.OptionsBuilder;
import org.openjdk.jmh.runner.options.TimeValue;

import java.util.Collection;
import java.util.Locale;

/** Runs the JMH benchmarks whose names match args[0] (a regular expression; all when absent). Brief runs: one fork. */
public final class BenchMain {

    private BenchMain() {
    }

    public static void main(String[] args) throws Exception {
        if (args.length > 0 && args[0].strip().startsWith("convergence")) {
            SolveConvergence.main(args[0].strip().split("\\s+")); // one Maven property, split into words
            return;
        }
        String include = args.length > 0 && !args[0].isBlank() ? args[0] : ".*";
        Options options = new OptionsBuilder()
                .include(include)
                .forks(1)
                .warmupIterations(3)
                .warmupTime(TimeValue.seconds(1))
                .measurementIterations(5)
                .measurementTime(TimeValue.seconds(1))
                .build();
        Collection<RunResult> results = new Runner(options).run();
        // medians of the measurement iterations: robust against a neighbour's load on a shared machine
        System.out.println();
        System.out.println("Medians of the measurement iterations (min .. max):");
        for (RunResult r : results) {
            double[] scores = r.getBenchmarkResults().stream()
                    .flatMap(b -> b.getIterationResults().stream())
                    .mapToDouble(i -> i.getPrimaryResult().getScore())
                    .sorted().toArray();
            if (scores.length == 0) {
                continue;
            }
            int n = scores.length;
            double median = n % 2 == 1 ? scores[n / 2] : 0.5 * (scores[n / 2 - 1] + scores[n / 2]);
            System.out.println(String.format(Locale.ROOT, "%-60s %10.3f %s  (%.3f .. %.3f)",
                    r.getParams().getBenchmark(), median, r.getPrimaryResult().getScoreUnit(), scores[0],
                    scores[n - 1]));
        }
    }
}
