package breakwater.design;

import breakwater.network.FrequencyGrid;
import breakwater.network.ImpedanceAnalysis;
import breakwater.network.ImpedanceCurve;
import breakwater.network.ImpedanceMetrics;
import breakwater.network.NetworkBuilder;
import breakwater.network.PowerNetwork;
import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.InputException;
import breakwater.scenario.Footprint;
import breakwater.scenario.Scenario;
import breakwater.timedomain.LoadPattern;
import breakwater.timedomain.PoleResidueModel;
import breakwater.timedomain.ResonanceResponse;
import breakwater.network.AntiResonance;
import java.util.ArrayList;
import java.util.List;
import breakwater.timedomain.Waveform;
import breakwater.timedomain.UnboundedWorstCaseException;
import breakwater.timedomain.WorstCase;
import breakwater.timedomain.WorstCaseAnalyzer;

import java.util.Objects;
import java.util.Optional;

/**
 * The single judge of a bank on a rail, used by the solver and the reports alike (docs/architecture.md#package-order).
 */
public final class BankEvaluator {
    private final Scenario scenario;
    private final Optional<Footprint> footprint;
    private final FrequencyGrid reportGrid;
    private final Limits limits;

    /**
     * @throws InputException when the worst case would be unbounded: ideal load edges (no edge time) and
     *                        no capacitance directly at the load node, so Z(∞) is infinite
     */
    public BankEvaluator(Scenario scenario, Optional<Footprint> footprint) throws InputException {
        this(scenario, footprint, Limits.of(scenario.rail()));
    }

    private BankEvaluator(Scenario scenario, Optional<Footprint> footprint, Limits limits) throws InputException {
        this.scenario = Objects.requireNonNull(scenario);
        this.footprint = Objects.requireNonNull(footprint);
        this.limits = Objects.requireNonNull(limits);
        this.reportGrid = FrequencyGrid.aroundBand(scenario.band(), FrequencyGrid.DEFAULT_POINTS_PER_DECADE);
        PowerNetwork fixed = NetworkBuilder.build(scenario, java.util.List.of(), footprint);
        if (!scenario.rail().hasEdgeTime() && !fixed.hasFiniteHighFrequencyLimit()) {
            throw new InputException(Diagnostic.of(scenario.source(),
                    "rail.edge_time: with ideal load edges (edge_time absent or 0) the worst case is unbounded here: the load node has "
                            + "no capacitance without series inductance, so the load sees an inductance at the "
                            + "highest frequencies and an instant current step causes an unbounded spike")
                    .withHint("set rail.edge_time to the fastest load swing (e.g. edge_time = \"1 ns\"), or add a "
                            + "[die] capacitance at the load node (behind the [package]), or a [plane] when the "
                            + "load sits at the board node."));
        }
    }

    /**
     * The same judge with the pass/fail band narrowed to {@code limits} (never widened beyond the rail's
     * tolerance): used to ask for a bank no worse than an existing one, or for a given excursion.
     */
    public BankEvaluator withLimits(Limits tighter) {
        try {
            return new BankEvaluator(scenario, footprint, limits.intersect(tighter));
        } catch (InputException e) {
            throw new IllegalStateException("the scenario was accepted once already", e);
        }
    }

    /** The band the worst case must stay in. */
    public Limits limits() {
        return limits;
    }

    /** The I_min operating point V_nom − Z(0)·I_min; Z(0) = R_reg + R_pkg does not depend on the bank. */
    public double operatingPointV() {
        var r = scenario.rail();
        double z0 = scenario.regulator().resistanceOhms()
                + (scenario.packagePath().present() ? scenario.packagePath().resistanceOhms() : 0.0);
        return r.voltageV() - z0 * r.minCurrentA();
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

    /**
     * Full evaluation of {@code bank}: impedance on the report grid, flatness, cost, board limits, and the
     * exact worst case with the patterns that reach it.
     */
    public Evaluation evaluate(CapacitorBank bank) {
        PowerNetwork network = NetworkBuilder.build(scenario, bank.entries(), footprint);
        ImpedanceCurve curve = ImpedanceCurve.sweep(network, reportGrid);
        ImpedanceMetrics metrics = ImpedanceAnalysis.analyze(network, curve, scenario.band(), targetImpedanceOhms());
        PoleResidueModel model = PoleResidueModel.of(network);
        WorstCase wc = worstCase(model);
        List<ResonanceFigures> responses = new ArrayList<>();
        for (AntiResonance a : metrics.antiResonances()) {
            responses.add(resonance(model, a.frequencyHz()));
        }
        return new Evaluation(bank, network, curve, metrics, CostBreakdown.of(bank, scenario.cost()),
                BoardCheck.violations(bank, scenario.board(), scenario.regions()), model, wc, figures(network, wc), responses);
    }

    private static ResonanceFigures resonance(PoleResidueModel model, double frequencyHz) {
        try {
            return new ResonanceFigures(ResonanceResponse.of(model, frequencyHz),
                    ResonanceResponse.ownStepPeakOhms(model, frequencyHz));
        } catch (IllegalArgumentException noOscillatingMode) {
            // a local maximum of |Z| made by real poles only: nothing rings there
            return new ResonanceFigures(new ResonanceResponse(frequencyHz, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, 0), Double.NaN);
        }
    }

    /** The worst-case droop pattern laid out in time, with the load voltage it causes. */
    public Waveform droopWaveform(Evaluation e) {
        return waveform(e, e.worstCase().droopPattern());
    }

    /** The worst-case overshoot pattern laid out in time, with the load voltage it causes. */
    public Waveform overshootWaveform(Evaluation e) {
        return waveform(e, e.worstCase().overshootPattern());
    }

    private Waveform waveform(Evaluation e, LoadPattern pattern) {
        var r = scenario.rail();
        return Waveform.of(e.model(), pattern, r.currentStepA(), r.minCurrentA(), r.voltageV(),
                e.network().dcResistanceOhms());
    }

    /** The exact worst case of {@code network} in volts: the one computation solver and reports share. */
    public WorstCaseVolts worstCaseVolts(PowerNetwork network) {
        return worstCaseVolts(network, PoleResidueModel.of(network));
    }

    /** As {@link #worstCaseVolts(PowerNetwork)}, from the network's model already built. */
    public WorstCaseVolts worstCaseVolts(PowerNetwork network, PoleResidueModel model) {
        breakwater.timedomain.WorstCasePerAmpere f;
        try {
            // the figures-only path: the same exact values as analyze(), without building the patterns
            f = WorstCaseAnalyzer.figures(model, scenario.rail().edgeTimeS());
        } catch (UnboundedWorstCaseException e) {
            throw new IllegalStateException("unbounded worst case after the constructor's check", e);
        }
        return WorstCaseVolts.of(scenario.rail(), network.dcResistanceOhms(), f.droopOhms(), f.overshootOhms(),
                limits.lowerV(), limits.upperV());
    }

    private WorstCaseVolts figures(PowerNetwork network, WorstCase wc) {
        return WorstCaseVolts.of(scenario.rail(), network.dcResistanceOhms(), wc.droopOhms(), wc.overshootOhms(),
                limits.lowerV(), limits.upperV());
    }

    private WorstCase worstCase(PoleResidueModel model) {
        try {
            return WorstCaseAnalyzer.analyze(model, scenario.rail().edgeTimeS());
        } catch (UnboundedWorstCaseException e) {
            // excluded by the constructor's check; reaching here is a bug
            throw new IllegalStateException("unbounded worst case after the constructor's check", e);
        }
    }
}
