package breakwater.bench;

import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CandidateJudge;
import breakwater.design.Judgement;
import breakwater.scenario.Band;
import breakwater.scenario.Board;
import breakwater.scenario.CostModel;
import breakwater.scenario.Die;
import breakwater.scenario.PackagePath;
import breakwater.scenario.Plane;
import breakwater.scenario.Rail;
import breakwater.scenario.Regulator;
import breakwater.scenario.Scenario;
import breakwater.scenario.SolverSettings;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

/**
 * The solver's judge of one bank (impedance on the solver grid, exact worst case, cost, board limits) on
 * an eight-part-type bank with regulator, plane, package and die: once with ideal load edges, once with a
 * 1 ns edge time. Single thread. Successive calls judge neighbouring banks (one count changes), as the
 * solver does, so the poles warm-start from the last bank's; {@code idealEdgesColdStart} measures the same
 * banks with every model from the eigenvalue search. All these banks pass (the ideal-edge worst case is
 * inside the 3 % band), so with 1 ns edges the judge settles them by their ideal-edge worst case;
 * {@code edgeTime1nsNearLimit} narrows the band until only the exact slew-limited figure can decide.
 * Run: {@code ./mvnw -B -Pbench -DskipTests verify -Dbench.args=BankEvaluator}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class BankEvaluatorBench {

    /** Invented parts spanning 220 µF polymer to 10 nF 0201 (R, ESL, mounting, cost). */
    static final List<Part> PARTS = List.of(
            Part.of("bulk-220u", 220e-6, 12e-3, 2.0e-9, 0.8e-9, 0.22),
            Part.of("bulk-100u", 100e-6, 25e-3, 1.5e-9, 0.7e-9, 0.16),
            Part.of("x5r-22u", 22e-6, 4e-3, 0.68e-9, 0.7e-9, 0.04),
            Part.of("x5r-10u", 10e-6, 6e-3, 0.5e-9, 0.6e-9, 0.02),
            Part.of("x5r-2u2", 2.2e-6, 12e-3, 0.36e-9, 0.45e-9, 0.008),
            Part.of("x5r-1u", 1e-6, 30e-3, 0.2e-9, 0.35e-9, 0.008),
            Part.of("x5r-100n", 100e-9, 55e-3, 0.18e-9, 0.35e-9, 0.003),
            Part.of("x7r-10n", 10e-9, 80e-3, 0.33e-9, 0.45e-9, 0.0015));
    static final int[] COUNTS = {3, 2, 1, 8, 1, 12, 25, 30};
    /**
     * A tolerance that leaves 24.8 mV for the droop: the banks' slew-limited worst droops at 1 ns (24.4 …
     * 24.6 mV) pass, their ideal-edge droops (25.1 … 25.2 mV) do not, so no cheap bound settles them and
     * every judgement runs the exact slew-limited computation. (At 3 % all these banks pass, with ideal
     * edges too: 25.1 … 25.2 mV of 25.5 mV allowed.)
     */
    static final double NEAR_LIMIT_TOLERANCE = 0.029222;

    CandidateJudge ideal;
    CandidateJudge idealCold;
    CandidateJudge edged;
    CandidateJudge edgedNearLimit;
    int flip;

    static Scenario scenario(double edgeTimeS) {
        return scenario(edgeTimeS, 0.03);
    }

    static Scenario scenario(double edgeTimeS, double toleranceFraction) {
        return new Scenario("bench", new Rail("bench core", 0.9, toleranceFraction, 5.0, 2.5, edgeTimeS), new Band(1e4, 1.5e8),
                new Regulator(0.3e-3, 18e-9), new Plane(5e-9, 0.4e-3), PackagePath.of(0.3e-3, 10e-12),
                new Die(600e-9, 4e-3), Path.of("none.csv"), Board.UNLIMITED, Map.of(), new CostModel(0.004, 0.1, ""),
                SolverSettings.DEFAULT, false, "");
    }

    @Setup
    public void setUp() throws Exception {
        ideal = new CandidateJudge(new BankEvaluator(scenario(0), Optional.empty()), PARTS);
        idealCold = new CandidateJudge(new BankEvaluator(scenario(0), Optional.empty()), PARTS, false);
        edged = new CandidateJudge(new BankEvaluator(scenario(1e-9), Optional.empty()), PARTS);
        edgedNearLimit = new CandidateJudge(new BankEvaluator(scenario(1e-9, NEAR_LIMIT_TOLERANCE), Optional.empty()),
                PARTS);
    }

    /** Alternates one count so that no two calls judge the same bank. */
    private int[] next() {
        int[] c = COUNTS.clone();
        c[7] += (flip++ & 7);
        return c;
    }

    @Benchmark
    public Judgement idealEdges() {
        return ideal.judge(next());
    }

    /** As {@link #idealEdges}, every model from the eigenvalue search (no warm start from the last bank). */
    @Benchmark
    public Judgement idealEdgesColdStart() {
        return idealCold.judge(next());
    }

    @Benchmark
    public Judgement edgeTime1ns() {
        return edged.judge(next());
    }

    /** As {@link #edgeTime1ns} with the tolerance {@link #NEAR_LIMIT_TOLERANCE}: the exact path on every bank. */
    @Benchmark
    public Judgement edgeTime1nsNearLimit() {
        return edgedNearLimit.judge(next());
    }
}
