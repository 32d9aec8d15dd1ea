package breakwater.bench;

import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.options.Options;
import org.openjdk.jmh.runner.options.OptionsBuilder;
import org.openjdk.jmh.runner.options.TimeValue;

/** Runs the JMH benchmarks whose names match args[0] (a regular expression; all when absent). Brief runs: one fork. */
public final class BenchMain {

    private BenchMain() {
    }

    public static void main(String[] args) throws Exception {
        if (args.length > 0 && args[0].equals("convergence")) {
            SolveConvergence.main(args);
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
        new Runner(options).run();
    }
}
