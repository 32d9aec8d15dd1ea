package breakwater.timedomain;

import java.util.ArrayList;
import java.util.List;

/**
 * How much of a worst-case response comes from load activity older than given times
 * (docs/worst-case.md#droop-by-age): the response at the worst instant is (h ∗ u)(T) + D₀·u(0) + L∞·u'(T),
 * a sum over lags, so the part due to the load current (above I_min) drawn more than a before the worst
 * instant is the response of the pattern cut to zero on [0, a): ∫_a^∞ h(τ)·u(τ) dτ, exactly, by the same
 * hat weights ({@link HatWeights#response}). It says where the model's limits matter most: activity older
 * than the regulator's loop response time is answered by the regulator model alone, which has no loop.
 */
public final class DroopByAge {

    /** The ages reported: one per decade from 10 ns to 100 µs, which spans board and regulator time scales. */
    public static final List<Double> AGES_S = List.of(10e-9, 100e-9, 1e-6, 10e-6, 100e-6);

    /**
     * The part of the response due to activity older than an age, per ampere of ΔI.
     *
     * @param ageS       the age a, s
     * @param olderOhms  ∫_a^∞ h u, Ω per ampere
     */
    public record Share(double ageS, double olderOhms) {
    }

    private DroopByAge() {
    }

    /** The shares of {@code pattern}'s response at each of {@link #AGES_S}. */
    public static List<Share> of(PoleResidueModel model, LoadPattern pattern) {
        List<Share> out = new ArrayList<>();
        for (double a : AGES_S) {
            out.add(new Share(a, olderThan(model, pattern, a)));
        }
        return out;
    }

    /** ∫_a^∞ h(τ) u(τ) dτ for the pattern u: its response with u set to 0 on lags [0, a), per ampere. */
    public static double olderThan(PoleResidueModel model, LoadPattern pattern, double ageS) {
        if (!(ageS >= 0) || !Double.isFinite(ageS)) {
            throw new IllegalArgumentException("age must be finite and >= 0, got " + ageS);
        }
        if (ageS == 0) {
            return HatWeights.response(model, pattern);
        }
        double[] lags = pattern.lagsS();
        double[] vals = pattern.values();
        int n = lags.length;
        int j = 0;
        while (j < n && lags[j] <= ageS) {
            j++;
        }
        double older; // u just beyond the age, on the older side
        if (j == n) {
            older = vals[n - 1];
        } else {
            int i = j - 1;
            older = lags[i] == ageS ? vals[i]
                    : vals[i] + (vals[j] - vals[i]) * (ageS - lags[i]) / (lags[j] - lags[i]);
        }
        int m = 3 + (n - j);
        double[] cutLags = new double[m];
        double[] cutVals = new double[m];
        cutLags[1] = ageS;
        cutLags[2] = ageS;
        cutVals[2] = Math.min(1, Math.max(0, older));
        for (int k = j; k < n; k++) {
            cutLags[3 + k - j] = lags[k];
            cutVals[3 + k - j] = vals[k];
        }
        return HatWeights.response(model, new LoadPattern(cutLags, cutVals));
    }
}
