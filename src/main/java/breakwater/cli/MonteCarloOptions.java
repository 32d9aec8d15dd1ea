package breakwater.cli;

import breakwater.design.MonteCarlo;
import breakwater.diagnostic.InputException;
import breakwater.scenario.Scenario;
import picocli.CommandLine;
import picocli.CommandLine.Option;

import java.util.Optional;

/**
 * {@code --monte-carlo N}, {@code --mc-seed}, {@code --spread}, {@code --mount-spread} and the plane, package
 * and die spreads: part-to-part and layout spread of the chosen bank.
 */
final class MonteCarloOptions {
    @Option(names = "--monte-carlo", paramLabel = "N",
            description = {"Also judge N Monte Carlo samples of the bank (checked or found), each with its parts "
                    + "drawn within their tolerances (uniform): capacitance within the catalog's tolerance column, else by "
                    + "dielectric C0G 5 %%, X7R 10 %%, X5R 20 %%, polymer/tantalum/other 20 %%; ESR and ESL within "
                    + "--spread; mounting inductance within --mount-spread; plane, package and die values only "
                    + "when asked (--plane-spread, --package-spread, --die-spread). All parts of one type move "
                    + "together (one reel: the pessimistic choice). "
                    + "Reports the worst droop and overshoot distribution (p50, p95, p99, max) and the yield. "
                    + "N is 1 to 1000000; the statistics take about 64 bytes of heap per sample."})
    Integer samples;

    @Option(names = "--mc-seed", paramLabel = "N",
            description = "Seed of the Monte Carlo samples (default: [solver] seed, else 1); same seed, same samples.")
    Long seed;

    @Option(names = "--spread", paramLabel = "PCT", converter = PercentConverter.class, defaultValue = "20",
            description = "ESR and ESL spread for --monte-carlo, in percent either side (default: ${DEFAULT-VALUE} %%).")
    double spreadFraction;

    @Option(names = "--mount-spread", paramLabel = "PCT", converter = PercentConverter.class, defaultValue = "20",
            description = "Mounting-inductance spread for --monte-carlo (footprint and via geometry, our default "
                    + "choice), in percent either side (default: ${DEFAULT-VALUE} %%).")
    double mountSpreadFraction;

    @Option(names = "--plane-spread", paramLabel = "PCT", converter = PercentConverter.class, defaultValue = "0",
            description = "Plane capacitance and resistance spread for --monte-carlo, percent either side (default: ${DEFAULT-VALUE}).")
    double planeSpreadFraction;

    @Option(names = "--package-spread", paramLabel = "PCT", converter = PercentConverter.class, defaultValue = "0",
            description = "Package resistance and inductance spread for --monte-carlo, percent either side (default: ${DEFAULT-VALUE}).")
    double packageSpreadFraction;

    @Option(names = "--die-spread", paramLabel = "PCT", converter = PercentConverter.class, defaultValue = "0",
            description = "Die capacitance and resistance spread for --monte-carlo, percent either side (default: ${DEFAULT-VALUE}).")
    double dieSpreadFraction;

    boolean enabled() {
        if (samples == null) {
            return false;
        }
        if (samples < 1 || samples > MonteCarlo.MAX_SAMPLES) {
            throw new UsageException("--monte-carlo is the number of samples, 1 to " + MonteCarlo.MAX_SAMPLES
                    + ", got " + samples + (samples == 0 ? "; leave the option out to draw none" : ""));
        }
        long needMb = samples * MonteCarlo.BYTES_PER_SAMPLE / (1024 * 1024) + 1;
        Runtime rt = Runtime.getRuntime();
        long heapMb = rt.maxMemory() / (1024 * 1024);
        if (needMb > heapMb / 2) {
            throw new UsageException("--monte-carlo " + samples + " needs about " + needMb + " MB of heap for its "
                    + "statistics, more than half of the " + heapMb + " MB this Java allows; draw fewer samples, or "
                    + "give more heap (BREAKWATER_JAVA_OPTS=-Xmx" + Math.max(1, 4 * needMb / 1024 + 1) + "g)");
        }
        return true;
    }

    /**
     * The draws asked for (seed: --mc-seed, else the scenario's [solver] seed), or none without --monte-carlo.
     *
     * @throws InputException before any work, when a catalog part's capacitance tolerance cannot be drawn
     *                        within, located at the part's row
     */
    Optional<MonteCarlo.Settings> settings(Inputs in) throws InputException {
        if (!enabled()) {
            return Optional.empty();
        }
        Scenario scenario = in.scenario();
        MonteCarlo.Settings s = new MonteCarlo.Settings(samples, seed != null ? seed : scenario.solver().seed(),
                spreadFraction, mountSpreadFraction,
                new MonteCarlo.StackupSpread(planeSpreadFraction, packageSpreadFraction, dieSpreadFraction),
                MonteCarlo.CATALOG_OR_DIELECTRIC);
        in.checkTolerances(s.tolerance());
        return Optional.of(s);
    }

    /** "20", "20%", "20 %" are all 20 %. */
    static final class PercentConverter implements CommandLine.ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            String v = value.strip();
            if (v.endsWith("%")) {
                v = v.substring(0, v.length() - 1).strip();
            }
            double pct;
            try {
                pct = Double.parseDouble(v);
            } catch (NumberFormatException e) {
                throw new CommandLine.TypeConversionException("'" + value + "' is not a percentage; write e.g. 20 or 20%");
            }
            if (!(pct >= 0 && pct < 100)) {
                throw new CommandLine.TypeConversionException("a spread must be at least 0 % and below 100 %, got '"
                        + value + "'");
            }
            return pct / 100;
        }
    }
}
