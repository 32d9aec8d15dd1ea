package breakwater.design;

import breakwater.network.ImpedanceCurve;
import breakwater.network.ImpedanceMetrics;
import breakwater.network.PowerNetwork;
import breakwater.timedomain.PoleResidueModel;
import breakwater.timedomain.WorstCase;

import java.util.List;

/**
 * Everything the tool knows about one bank on one rail: the single verdict used by {@code check},
 * {@code solve} and the reports alike.
 *
 * @param bank        the bank judged
 * @param network     its circuit
 * @param curve       |Z| at the load node on the report grid
 * @param impedance   flatness and anti-resonances in the band
 * @param cost        cost per board
 * @param board       board limits broken (empty when the bank fits)
 * @param model       pole–residue form of Z at the load node
 * @param worstCase   exact worst case per ampere of ΔI, with the patterns that reach it
 * @param figures     the worst case in volts against the tolerance band
 * @param resonances  for each anti-resonance (same order as {@code impedance.antiResonances()}), how hard a
 *                    load can ring it, per ampere of ΔI; NaN figures where no oscillating mode lies near it
 */
public record Evaluation(
        CapacitorBank bank,
        PowerNetwork network,
        ImpedanceCurve curve,
        ImpedanceMetrics impedance,
        CostBreakdown cost,
        List<BoardCheck.Violation> board,
        PoleResidueModel model,
        WorstCase worstCase,
        WorstCaseVolts figures,
        List<ResonanceFigures> resonances) {

    public Evaluation {
        board = List.copyOf(board);
        resonances = List.copyOf(resonances);
        if (resonances.size() != impedance.antiResonances().size()) {
            throw new IllegalArgumentException("one resonance response per anti-resonance expected");
        }
    }

    public boolean fitsBoard() {
        return board.isEmpty();
    }
}
