package breakwater.optimize;

import ai.timefold.solver.core.api.score.BendableScore;
import breakwater.design.Judgement;

/**
 * The one place where physics becomes integer score levels.
 * <ul>
 *   <li>hard: −(µV of worst-case excursion beyond the tolerance band, rounded up so that any excess
 *       counts) − 10 000 per part beyond a board limit − ppm of |Z| above the target (only when the
 *       scenario requires the target);</li>
 *   <li>soft 0: −cost per board in micro-units of currency;</li>
 *   <li>soft 1: −flatness in milli-dB: the band's max/min |Z| in dB plus 20·log10(peak/target);</li>
 *   <li>soft 2: −number of parts.</li>
 * </ul>
 */
final class ScoreLevels {
    static final long PER_BOARD_EXCESS = 10_000;

    private ScoreLevels() {
    }

    static BendableScore of(Judgement j) {
        long hard = -(microVoltsUp(j.droopExcessV()) + microVoltsUp(j.overshootExcessV())
                + PER_BOARD_EXCESS * j.boardExcess() + (long) Math.ceil(Math.max(0, j.targetExcess()) * 1e6));
        long cost = -Math.round(j.costTotal() * 1e6);
        double flat = j.flatnessDb() + 20 * Math.log10(Math.max(j.peakOverTarget(), 1e-12));
        long flatness = -Math.round(flat * 1000);
        return BendableScore.of(new long[] {hard}, new long[] {cost, flatness, -j.totalParts()});
    }

    private static long microVoltsUp(double volts) {
        return volts <= 0 ? 0 : (long) Math.ceil(volts * 1e6);
    }
}
