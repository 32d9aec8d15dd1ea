package breakwater.design;

import breakwater.network.FrequencyGrid;
import breakwater.network.ImpedanceAnalysis;
import breakwater.network.ImpedanceCurve;
import breakwater.network.ImpedanceMetrics;
import breakwater.network.NetworkBuilder;
import breakwater.network.PowerNetwork;
import breakwater.scenario.Footprint;
import breakwater.scenario.Scenario;

import java.util.Objects;
import java.util.Optional;

/**
 * The single judge of a bank on a rail, used by the solver and the reports alike (DESIGN.md §5).
 */
public final class BankEvaluator {
    private final Scenario scenario;
    private final Optional<Footprint> footprint;
    private final FrequencyGrid reportGrid;

    public BankEvaluator(Scenario scenario, Optional<Footprint> footprint) {
        this.scenario = Objects.requireNonNull(scenario);
        this.footprint = Objects.requireNonNull(footprint);
        this.reportGrid = FrequencyGrid.aroundBand(scenario.band(), FrequencyGrid.DEFAULT_POINTS_PER_DECADE);
    }

    public Scenario scenario() {
        return scenario;
    }

    public Optional<Footprint> footprint() {
        return footprint;
    }

    public FrequencyGrid reportGrid() {
        return reportGrid;
    }

    public double targetImpedanceOhms() {
        return scenario.rail().targetImpedanceOhms();
    }

    /** Full evaluation of {@code bank}: impedance on the report grid, flatness, cost, board limits. */
    public Evaluation evaluate(CapacitorBank bank) {
        PowerNetwork network = NetworkBuilder.build(scenario, bank.entries(), footprint);
        ImpedanceCurve curve = ImpedanceCurve.sweep(network, reportGrid);
        ImpedanceMetrics metrics = ImpedanceAnalysis.analyze(network, curve, scenario.band(), targetImpedanceOhms());
        return new Evaluation(bank, network, curve, metrics, CostBreakdown.of(bank, scenario.cost()),
                BoardCheck.violations(bank, scenario.board()));
    }
}
