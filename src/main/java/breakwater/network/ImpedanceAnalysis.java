package breakwater.network;

import breakwater.scenario.Band;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * Flatness of |Z| across the band: peak, minimum, flatness (max/min in dB) and anti-resonances.
 *
 * <p>Extremes are found on the grid, then refined by Brent's method (Commons Math {@link BrentOptimizer})
 * on ln f between the neighbouring grid points, against the network itself. With a relative tolerance of
 * 1e-10 on ln f the frequency of a maximum is located far better than the required 0.1 %.
 *
 * <p>Q of an anti-resonance is taken from the curvature of |Z| at its peak: writing f = f₀·e^δ, an
 * isolated parallel resonance has |Z| = Z_p / √(1 + Q²(e^δ − e^−δ)²) ≈ Z_p·(1 − 2Q²δ²), so
 * Q = √(−(d²|Z|/dδ²) / (4·Z_p)). For a parallel R‖L‖C this equals the textbook Q = R·√(C/L) and the
 * half-power definition f₀/Δf₋₃dB (circuit theory handbook identity); for a capacitor with series
 * resistance R_s across an inductance it approaches √(L/C)/R_s when Q ≫ 1. It is defined for every
 * local maximum, also where the peak is too shallow to have −3 dB points.
 */
public final class ImpedanceAnalysis {
    /**
     * A local extremum of |Z| counts when its prominence exceeds 0.1 % of its value (about 0.009 dB);
     * smaller bumps are rounding noise or too slight to matter to a design.
     */
    public static final double MIN_PROMINENCE = 1e-3;

    /**
     * Relative tolerance of Brent's method on ln f: locates an extremum to 1e-10 of ln f (a few 1e-9 in
     * frequency), far inside the 0.1 % required ({@code ImpedanceAnalysisTest.refinedPeakFrequencyIsBetterThanATenthOfAPercent});
     * a peak's value, flat there, is then exact to rounding.
     */
    private static final double BRENT_RELATIVE_TOLERANCE = 1e-10;

    /** Absolute tolerance of Brent's method on ln f (matters only near 1 Hz, where ln f = 0). */
    private static final double BRENT_ABSOLUTE_TOLERANCE = 1e-14;

    /**
     * Evaluation cap of one Brent search on one grid interval, which usually needs a few dozen: the cap
     * only stops a runaway (Commons Math then throws, which ends the run as a bug, never as a figure).
     */
    private static final int BRENT_MAX_EVALUATIONS = 200;

    /**
     * Step δ in ln f of the first curvature estimate of Q, whose result sets the second step: small
     * against the peak width 1/Q of moderate resonances, large enough that |Z| changes well above
     * rounding.
     */
    private static final double CURVATURE_STEP = 1e-3;

    /**
     * Second pass: δ = min(1e-3, this/Q), a small fraction of the peak's half-power width 1/Q in ln f,
     * where the parabola |Z| ≈ Z_p·(1 − 2Q²δ²) holds: the next term makes the estimate of Q² wrong by
     * about (Qδ)² ≤ 4e-4 ({@code ImpedanceAnalysisTest.singleTankPeakMatchesHandbookApproximations}).
     */
    private static final double CURVATURE_STEP_PER_Q = 0.02;

    private ImpedanceAnalysis() {
    }

    /**
     * Full analysis: grid search on {@code curve}, refined against {@code network}.
     *
     * @param network    the network the curve was swept from
     * @param curve      |Z| on a grid that covers the band (ideally widened beyond it)
     * @param band       where flatness is judged
     * @param targetOhms target impedance
     */
    public static ImpedanceMetrics analyze(PowerNetwork network, ImpedanceCurve curve, Band band, double targetOhms) {
        DoubleUnaryOperator mag = network::magnitude;
        int n = curve.size();
        double[] f = curve.frequenciesHz();
        double[] m = new double[n];
        for (int i = 0; i < n; i++) {
            m[i] = curve.magnitudeOhms(i);
        }
        // band edges evaluated exactly, so a curve rising out of the band is judged at the edge itself
        double peak = mag.applyAsDouble(band.fromHz());
        double peakHz = band.fromHz();
        double min = peak;
        double minHz = peakHz;
        double atTo = mag.applyAsDouble(band.toHz());
        if (atTo > peak) {
            peak = atTo;
            peakHz = band.toHz();
        }
        if (atTo < min) {
            min = atTo;
            minHz = band.toHz();
        }
        List<AntiResonance> anti = new ArrayList<>();
        for (int i = 1; i < n - 1; i++) {
            boolean localMax = m[i] > m[i - 1] && m[i] >= m[i + 1] && prominence(m, i, +1) > MIN_PROMINENCE * m[i];
            boolean localMin = m[i] < m[i - 1] && m[i] <= m[i + 1] && prominence(m, i, -1) > MIN_PROMINENCE * m[i];
            if (!localMax && !localMin) {
                if (band.contains(f[i])) {
                    if (m[i] > peak) {
                        peak = m[i];
                        peakHz = f[i];
                    }
                    if (m[i] < min) {
                        min = m[i];
                        minHz = f[i];
                    }
                }
                continue;
            }
            Extremum refined = refine(mag, f[i - 1], f[i + 1], localMax ? GoalType.MAXIMIZE : GoalType.MINIMIZE);
            double fr = refined.frequencyHz();
            double zr = refined.magnitudeOhms();
            if (!band.contains(fr)) {
                continue;
            }
            if (localMax) {
                anti.add(new AntiResonance(fr, zr, curvatureQ(mag, fr, zr)));
                if (zr > peak) {
                    peak = zr;
                    peakHz = fr;
                }
            } else if (zr < min) {
                min = zr;
                minHz = fr;
            }
        }
        double flatnessDb = 20 * Math.log10(peak / min);
        return new ImpedanceMetrics(targetOhms, peak, peakHz, min, minHz, flatnessDb, anti);
    }

    /**
     * Topographic prominence of the extremum at {@code i} ({@code sign} +1 for a maximum, −1 for a
     * minimum): how far it stands above (below) the higher (lower) of the two deepest points before the
     * curve passes it again on either side. Rounding noise on a flat curve has a prominence near 1e-16
     * relative; a resonance worth naming has far more.
     */
    static double prominence(double[] m, int i, int sign) {
        double peak = sign * m[i];
        double leftLow = peak;
        for (int j = i - 1; j >= 0 && sign * m[j] <= peak; j--) {
            leftLow = Math.min(leftLow, sign * m[j]);
        }
        double rightLow = peak;
        for (int j = i + 1; j < m.length && sign * m[j] <= peak; j++) {
            rightLow = Math.min(rightLow, sign * m[j]);
        }
        return peak - Math.max(leftLow, rightLow);
    }

    /**
     * A refined extremum of |Z|.
     *
     * @param frequencyHz   where it lies
     * @param magnitudeOhms |Z| there
     */
    public record Extremum(double frequencyHz, double magnitudeOhms) {
    }

    /** Brent search on ln f in [lo, hi]. */
    static Extremum refine(DoubleUnaryOperator mag, double loHz, double hiHz, GoalType goal) {
        return refineExtremum(mag, loHz, hiHz, goal == GoalType.MAXIMIZE);
    }

    /** Brent search for the maximum (or minimum) of |Z| on ln f in [lo, hi], as the full analysis does. */
    public static Extremum refineExtremum(DoubleUnaryOperator mag, double loHz, double hiHz, boolean maximum) {
        GoalType goal = maximum ? GoalType.MAXIMIZE : GoalType.MINIMIZE;
        BrentOptimizer brent = new BrentOptimizer(BRENT_RELATIVE_TOLERANCE, BRENT_ABSOLUTE_TOLERANCE);
        double a = Math.log(loHz);
        double b = Math.log(hiHz);
        UnivariatePointValuePair best = brent.optimize(new MaxEval(BRENT_MAX_EVALUATIONS),
                new UnivariateObjectiveFunction(x -> mag.applyAsDouble(Math.exp(x))), goal,
                new SearchInterval(a, b, 0.5 * (a + b)));
        double fr = Math.exp(best.getPoint());
        return new Extremum(fr, best.getValue());
    }

    /** Q from the curvature of |Z| at a peak (see class Javadoc); two passes to pick a step suited to Q. */
    static double curvatureQ(DoubleUnaryOperator mag, double f0, double z0) {
        double q = curvatureQ(mag, f0, z0, CURVATURE_STEP);
        if (q > 0 && Double.isFinite(q)) {
            double step = Math.min(CURVATURE_STEP, CURVATURE_STEP_PER_Q / q);
            q = curvatureQ(mag, f0, z0, step);
        }
        return q;
    }

    private static double curvatureQ(DoubleUnaryOperator mag, double f0, double z0, double delta) {
        double up = mag.applyAsDouble(f0 * Math.exp(delta));
        double down = mag.applyAsDouble(f0 * Math.exp(-delta));
        double second = (up + down - 2 * z0) / (delta * delta);
        if (!(second < 0)) {
            return 0.0;
        }
        return Math.sqrt(-second / (4 * z0));
    }
}
