package breakwater.bench;

import breakwater.catalog.Catalog;
import breakwater.catalog.CatalogReader;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.optimize.BankSearch;
import breakwater.optimize.MaxCounts;
import breakwater.optimize.SearchResult;
import breakwater.optimize.SearchSettings;
import breakwater.scenario.Scenario;
import breakwater.scenario.ScenarioReader;

import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Whole-search benchmark (not JMH: it measures a search, not a call): for each demo scenario, several
 * seeded searches of {@code seconds} each; the best-known cost is the cheapest passing bank any of them
 * found, and each run reports when it first reached a passing bank within 1 % of that cost.
 * Run: {@code ./mvnw -B -Pbench -DskipTests verify -Dbench.args=convergence}; for other durations
 * {@code -Dbench.args="convergence 30 3"} (seconds per run, runs per scenario).
 */
public final class SolveConvergence {
    private SolveConvergence() {
    }

    public static void main(String[] args) throws Exception {
        // args: "convergence" [seconds per run] [runs per scenario] [scenario files...]
        int seconds = args.length > 1 ? Integer.parseInt(args[1]) : 60;
        int runs = args.length > 2 ? Integer.parseInt(args[2]) : 3;
        List<String> scenarios = args.length > 3 ? List.of(args).subList(3, args.length)
                : List.of("scenarios/drone-core.toml", "scenarios/buoy-io.toml", "scenarios/spectrometer-ddr.toml");
        System.out.printf(Locale.ROOT, "%d runs of %d s each, %d cores%n", runs, seconds,
                Runtime.getRuntime().availableProcessors());
        for (String file : scenarios) {
            Scenario s = ScenarioReader.read(Path.of(file), file);
            Catalog c = CatalogReader.read(s.catalogFile(), s.catalogFile().toString());
            BankEvaluator ev = new BankEvaluator(s, Optional.empty());
            List<SearchResult> results = new ArrayList<>();
            for (int r = 0; r < runs; r++) {
                BankSearch search = new BankSearch(ev, c.parts(), MaxCounts.of(c.parts(), s));
                // the settings a user gets from `solve --time-limit <seconds>s --seed <1 + 10 r>`
                SearchSettings settings = SearchSettings.defaults(Duration.ofSeconds(seconds), 1 + 10L * r);
                results.add(search.run(settings, CapacitorBank.EMPTY));
            }
            double best = results.stream().filter(x -> x.judgement().feasible())
                    .mapToDouble(x -> x.judgement().costTotal()).min().orElse(Double.NaN);
            System.out.printf(Locale.ROOT, "%s: best-known cost %.4f%n", file, best);
            for (SearchResult r : results) {
                System.out.printf(Locale.ROOT, "  seed %d: final %.4f (%s), first pass at %.1f s, within 1 %% at %.1f s, "
                                + "%d banks evaluated%n", r.seed(), r.judgement().costTotal(),
                        r.judgement().feasible() ? "passes" : "FAILS", r.secondsToReach(Double.POSITIVE_INFINITY),
                        r.secondsToReach(best * 1.01), r.evaluations());
            }
        }
    }
}
