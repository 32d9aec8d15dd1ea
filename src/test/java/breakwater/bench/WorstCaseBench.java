package breakwater.bench;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import breakwater.timedomain.PoleResidueModel;
import breakwater.timedomain.UnboundedWorstCaseException;
import breakwater.timedomain.WorstCase;
import breakwater.timedomain.WorstCaseAnalyzer;
import breakwater.timedomain.WorstCasePerAmpere;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Speed of the worst-case engine on an invented realistic rail: regulator 0.3 mΩ + 18 nH, plane
 * 6 nF/0.5 mΩ, eight bank part types (100 µF polymer … 1 nF 0201, ESL 0.2–1 nH, mounting 0.3–0.8 nH,
 * counts 1–20), package 0.4 mΩ/25 pH, die 150 nF/0.3 mΩ: 20 natural frequencies.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class WorstCaseBench {

    private PowerNetwork network;
    private PoleResidueModel model;
    private PowerNetwork candidate;
    private PoleResidueModel candidateModel;

    /** Edge time of the candidate benchmarks, s. */
    private static final double CANDIDATE_EDGE_S = 1e-9;

    private static SeriesBranch part(String label, double c, double esr, double esl, double mount, int n) {
        return new SeriesBranch(label, esr, esl + mount, c).parallel(n);
    }

    @Setup
    public void setUp() {
        List<SeriesBranch> board = new ArrayList<>();
        board.add(new SeriesBranch("plane", 0.5e-3, 0, 6e-9));
        board.add(part("polymer-100u", 100e-6, 10e-3, 1.0e-9, 0.8e-9, 2));
        board.add(part("mlcc-22u", 22e-6, 3e-3, 0.8e-9, 0.6e-9, 3));
        board.add(part("mlcc-10u", 10e-6, 4e-3, 0.5e-9, 0.5e-9, 6));
        board.add(part("mlcc-4u7", 4.7e-6, 6e-3, 0.4e-9, 0.45e-9, 8));
        board.add(part("mlcc-1u", 1e-6, 10e-3, 0.3e-9, 0.4e-9, 20));
        board.add(part("mlcc-220n", 220e-9, 15e-3, 0.3e-9, 0.4e-9, 10));
        board.add(part("mlcc-10n", 10e-9, 40e-3, 0.2e-9, 0.3e-9, 6));
        board.add(part("mlcc-1n", 1e-9, 80e-3, 0.2e-9, 0.3e-9, 1));
        network = new PowerNetwork(0.3e-3, 18e-9, board, true, 0.4e-3, 25e-12,
                List.of(new SeriesBranch("die", 0.3e-3, 0, 150e-9)));
        model = PoleResidueModel.of(network);
        candidate = candidateBank();
        candidateModel = PoleResidueModel.of(candidate);
    }

    /**
     * A typical candidate bank as the solver judges it (invented values): regulator 0.3 mΩ + 18 nH,
     * plane 5 nF/0.4 mΩ, eight part types (count × (ESR, ESL + mounting, C)), package 0.3 mΩ/10 pH, die
     * 600 nF/4 mΩ at the load node: 11 modes from 35 kHz to 1.1 GHz, Q 0.5–20.
     */
    static PowerNetwork candidateBank() {
        List<SeriesBranch> board = new ArrayList<>();
        board.add(new SeriesBranch("plane", 0.4e-3, 0, 5e-9));
        board.add(new SeriesBranch("a", 55e-3, 0.53e-9, 85e-9).parallel(25));
        board.add(new SeriesBranch("b", 30e-3, 0.55e-9, 0.6e-6).parallel(9));
        board.add(new SeriesBranch("c", 80e-3, 0.78e-9, 9.7e-9).parallel(36));
        board.add(new SeriesBranch("d", 12e-3, 0.81e-9, 1.54e-6).parallel(1));
        board.add(new SeriesBranch("e", 8e-3, 1.1e-9, 3.3e-6).parallel(7));
        board.add(new SeriesBranch("f", 4e-3, 1.38e-9, 13.2e-6).parallel(1));
        board.add(new SeriesBranch("g", 25e-3, 2.2e-9, 100e-6).parallel(2));
        board.add(new SeriesBranch("h", 12e-3, 2.8e-9, 220e-6).parallel(4));
        return new PowerNetwork(0.3e-3, 18e-9, board, true, 0.3e-3, 10e-12,
                List.of(new SeriesBranch("die", 4e-3, 0, 600e-9)));
    }

    @Benchmark
    public PoleResidueModel candidateModel() {
        return PoleResidueModel.of(candidate);
    }

    @Benchmark
    public WorstCase candidateIdealEdges() throws UnboundedWorstCaseException {
        return WorstCaseAnalyzer.idealEdges(candidateModel);
    }

    @Benchmark
    public WorstCase candidateEdgeLimited() {
        return WorstCaseAnalyzer.edgeLimited(candidateModel, CANDIDATE_EDGE_S);
    }

    @Benchmark
    public WorstCasePerAmpere candidateFiguresIdealEdges() throws UnboundedWorstCaseException {
        return WorstCaseAnalyzer.figures(candidateModel, 0.0);
    }

    @Benchmark
    public WorstCasePerAmpere candidateFiguresEdgeLimited() throws UnboundedWorstCaseException {
        return WorstCaseAnalyzer.figures(candidateModel, CANDIDATE_EDGE_S);
    }

    @Benchmark
    public PoleResidueModel model() {
        return PoleResidueModel.of(network);
    }

    @Benchmark
    public WorstCase modelAndIdealEdges() throws UnboundedWorstCaseException {
        return WorstCaseAnalyzer.idealEdges(PoleResidueModel.of(network));
    }

    @Benchmark
    public WorstCase edgeLimitedHalfNanosecond() {
        return WorstCaseAnalyzer.edgeLimited(model, 0.5e-9);
    }

    @Benchmark
    public WorstCase edgeLimitedFiveNanoseconds() {
        return WorstCaseAnalyzer.edgeLimited(model, 5e-9);
    }
}
