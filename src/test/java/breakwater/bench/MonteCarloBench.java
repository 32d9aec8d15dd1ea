package breakwater.bench;

import breakwater.catalog.BankFileReader;
import breakwater.catalog.Catalog;
import breakwater.catalog.CatalogReader;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.MonteCarlo;
import breakwater.scenario.Scenario;
import breakwater.scenario.ScenarioReader;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

/**
 * Time of a 1,000-sample Monte Carlo run on the drone-core demo rail with its hand-drawn bank (five part
 * types, 59 parts, 1 ns edge time: the slew-limited worst case per sample), on every core. One run per
 * measurement. Run from the project folder ({@code -Dbw.root=DIR} otherwise).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class MonteCarloBench {
    private BankEvaluator evaluator;
    private CapacitorBank bank;

    @Setup
    public void setUp() throws Exception {
        Path root = Path.of(System.getProperty("bw.root", "."));
        Scenario s = ScenarioReader.read(root.resolve("scenarios/drone-core.toml"), "drone-core.toml");
        Catalog c = CatalogReader.read(s.catalogFile(), "general-purpose.csv");
        bank = new CapacitorBank(BankFileReader.read(root.resolve("scenarios/drone-core.bank.csv"),
                "drone-core.bank.csv", c));
        evaluator = new BankEvaluator(s, Optional.empty());
    }

    @Benchmark
    public MonteCarlo.Result thousandSamples() {
        return MonteCarlo.run(evaluator, bank, new MonteCarlo.Settings(1000, 1, 0.2));
    }
}
