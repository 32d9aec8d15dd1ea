package breakwater.bench;

import breakwater.catalog.Catalog;
import breakwater.catalog.CatalogReader;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.optimize.BankSearch;
import breakwater.optimize.SearchResult;
import breakwater.optimize.SearchSettings;
import breakwater.scenario.Scenario;
import breakwater.scenario.ScenarioReader;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Whole-search benchmark (not JMH: it measures a search, not a call): for each scenario, several seeded
 * searches of {@code seconds} each, with the settings a user gets from {@code solve --time-limit <s>
 * --seed <1 + 10 r>} (the same candidates, screening and counts as {@code solve}). Per run it reports the
 * time to the first passing bank, the cost of the best bank at 10 s, at 30 s and at the end, each against
 * the best-known cost (the cheapest passing bank any run of this benchmark found), and the share of
 * judgements a bound settled.
 *
 * <p>Scenarios: the demo rails by default; the word {@code generated:N} stands for the benchmark's
 * demanding core rail ({@code src/test/resources/bench/core-rail.toml}) on a catalog of N invented parts
 * written by {@link CatalogGenerator} (seed 7) into {@code target/bench/}, not committed data.
 *
 * <p>Run: {@code ./mvnw -B -Pbench -DskipTests verify -Dbench.args="convergence 30 3"} (seconds per run,
 * runs per scenario, then optional scenario files or {@code generated:N}).
 */
public final class SolveConvergence {
    private SolveConvergence() {
    }

    public static void main(String[] args) throws Exception {
        // args: "convergence" [seconds per run] [runs per scenario] [scenario files or generated:N ...]
        int seconds = args.length > 1 ? Integer.parseInt(args[1]) : 60;
        int runs = args.length > 2 ? Integer.parseInt(args[2]) : 3;
        List<String> scenarios = args.length > 3 ? List.of(args).subList(3, args.length)
                : List.of("scenarios/drone-core.toml", "scenarios/buoy-io.toml", "scenarios/spectrometer-ddr.toml",
                "generated:400");
        System.out.printf(Locale.ROOT, "%d runs of %d s each, %d cores%n", runs, seconds,
                Runtime.getRuntime().availableProcessors());
        for (String name : scenarios) {
            Path file = name.startsWith("generated:") ? generated(Integer.parseInt(name.substring(10))) : Path.of(name);
            Scenario s = ScenarioReader.read(file, file.toString());
            Catalog c = CatalogReader.read(s.catalogFile(), s.catalogFile().toString());
            BankEvaluator ev = new BankEvaluator(s, Optional.empty());
            List<SearchResult> results = new ArrayList<>();
            List<String> settled = new ArrayList<>();
            String screening = "";
            for (int r = 0; r < runs; r++) {
                BankSearch search = BankSearch.forScenario(ev, c.parts());
                screening = search.screening().summary();
                // the settings a user gets from `solve --time-limit <seconds>s --seed <1 + 10 r>`
                SearchSettings settings = SearchSettings.defaults(Duration.ofSeconds(seconds), 1 + 10L * r);
                results.add(search.run(settings, CapacitorBank.EMPTY));
                var b = search.boundsSettled();
                settled.add(String.format(Locale.ROOT, "%d judged afresh, %.0f %% settled by a bound (%d passing by "
                                + "the model's sum, %d by the ideal-edge case, %d failing by |Z|)", b.judgements(),
                        100.0 * (b.bounded() + b.failedByImpedance()) / Math.max(1, b.judgements()),
                        b.passedByModelSum(), b.passedByIdealEdges(), b.failedByImpedance()));
            }
            double best = results.stream().filter(x -> x.judgement().feasible())
                    .mapToDouble(x -> x.judgement().costTotal()).min().orElse(Double.NaN);
            System.out.printf(Locale.ROOT, "%s (%d parts; %s): best-known cost %.4f%n", name, c.parts().size(),
                    screening, best);
            for (int k = 0; k < results.size(); k++) {
                SearchResult r = results.get(k);
                System.out.printf(Locale.ROOT, "  seed %d: first pass at %s, at 10 s %s, at 30 s %s, final %s; "
                                + "within 1 %% at %s, 2 %% at %s; %d banks evaluated; %s%n", r.seed(),
                        secs(r.secondsToReach(Double.POSITIVE_INFINITY)), costAt(r, 10, best), costAt(r, 30, best),
                        costAt(r, Double.POSITIVE_INFINITY, best), secs(r.secondsToReach(best * 1.01)),
                        secs(r.secondsToReach(best * 1.02)), r.evaluations(), settled.get(k));
            }
        }
    }

    private static String secs(double s) {
        return Double.isNaN(s) ? "never" : String.format(Locale.ROOT, "%.1f s", s);
    }

    /** The cost of the best passing bank found by {@code atSeconds}, and how far over the best-known. */
    static String costAt(SearchResult r, double atSeconds, double best) {
        double cost = Double.NaN;
        for (SearchResult.Improvement i : r.improvements()) {
            if (i.atSeconds() <= atSeconds && i.feasible()) {
                cost = Double.isNaN(cost) ? i.costTotal() : Math.min(cost, i.costTotal());
            }
        }
        if (atSeconds > r.seconds() + 1 && Double.isFinite(atSeconds)) {
            return "(run ended)";
        }
        return Double.isNaN(cost) ? "none passing"
                : String.format(Locale.ROOT, "%.4f (%+.1f %%)", cost, 100 * (cost / best - 1));
    }

    /** Writes the demanding core rail and a catalog of {@code parts} invented parts into target/bench/. */
    static Path generated(int parts) throws Exception {
        Path dir = Files.createDirectories(Path.of("target", "bench"));
        String catalog = "generated-" + parts + ".csv";
        CatalogGenerator.write(dir.resolve(catalog), parts, 7);
        String toml;
        try (InputStream in = SolveConvergence.class.getResourceAsStream("/bench/core-rail.toml")) {
            toml = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        return Files.writeString(dir.resolve("core-rail-" + parts + ".toml"), toml.replace("\"CATALOG\"", '"' + catalog + '"'));
    }
}
