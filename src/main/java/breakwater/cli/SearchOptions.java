package breakwater.cli;

import breakwater.optimize.SearchSettings;
import breakwater.scenario.Scenario;
import picocli.CommandLine.Option;

import java.time.Duration;

/** Search options shared by the commands that run the solver. */
final class SearchOptions {
    @Option(names = "--seed", paramLabel = "N",
            description = "Seed of the first solver (solver k uses N+k). Default: [solver] seed, else 1.")
    Long seed;

    @Option(names = "--time-limit", paramLabel = "DURATION", converter = Durations.Converter.class,
            description = "Search time, e.g. 30s, 2min, 500ms, counted from the program's start; the best bank "
                    + "so far is then judged and written. Default: [solver] time_limit, else 30 s.")
    Duration timeLimit;

    @Option(names = "--moves", paramLabel = "N",
            description = "Stop each solver after N evaluated moves; with --seed the run is reproducible: the "
                    + "same bank and files, and the same count of banks evaluated (every judgement a solver "
                    + "asked for, answers from the memo of judged banks included, summed over solvers).")
    long moves;

    @Option(names = "--solvers", paramLabel = "N",
            description = "Independent solvers run in parallel, 1 to 64 (default: one per core, at most 4).")
    Integer solvers;

    SearchSettings settings(Scenario scenario) {
        Duration limit = timeLimit != null ? timeLimit : scenario.solver().timeLimit();
        // the limit counts from the program's start: reading the inputs is part of the time promised
        // and for the judging and writing of the best bank after the search: a program leaves those a tenth
        // of the limit, at most half a second (about what they take on the demo rails)
        Duration whole = limit;
        Duration spent = Main.programStart().map(t -> Duration.between(t, java.time.Instant.now())
                .plusMillis(Math.min(500, whole.toMillis() / 10))).orElse(Duration.ZERO);
        limit = spent.isNegative() ? limit : limit.minus(spent);
        if (limit.compareTo(Duration.ofMillis(1)) < 0) {
            limit = Duration.ofMillis(1); // no time left: the search ends at once with the bank it starts from
        }
        long s = seed != null ? seed : scenario.solver().seed();
        SearchSettings settings = SearchSettings.defaults(limit, s);
        if (moves < 0) {
            throw new UsageException("--moves must be >= 0");
        }
        if (moves > 0) {
            settings = settings.withMoveLimit(moves);
        }
        if (solvers != null) {
            if (solvers < 1 || solvers > SearchSettings.MAX_SOLVERS) {
                throw new UsageException("--solvers is 1 to " + SearchSettings.MAX_SOLVERS + " (this machine has "
                        + Runtime.getRuntime().availableProcessors() + " cores; solvers beyond them share them), got "
                        + solvers);
            }
            settings = settings.withSolvers(solvers);
        }
        return settings;
    }
}
