package breakwater.timedomain;

import java.util.Arrays;

/**
 * A normalised load current u(lag) ∈ [0, 1] before the worst instant T, piecewise linear on ascending
 * lags (lag = T − t, so lag 0 is the worst instant). Two entries with the same lag express an ideal
 * jump; at such a lag {@link #u(double)} returns the first entry, the value nearer the worst instant.
 * Beyond the last lag the last value holds. The load current is i(T − lag) = I_min + ΔI·u(lag).
 *
 * @param lagsS  ascending (non-decreasing) lags, s, starting at 0
 * @param values u at each lag, in [0, 1]
 */
public record LoadPattern(double[] lagsS, double[] values) {

    public LoadPattern {
        if (lagsS.length != values.length || lagsS.length == 0) {
            throw new IllegalArgumentException("a load pattern needs equally many lags and values, at least one");
        }
        lagsS = lagsS.clone();
        values = values.clone();
        if (lagsS[0] != 0.0) {
            throw new IllegalArgumentException("a load pattern starts at lag 0 (the worst instant), got " + lagsS[0]);
        }
        for (int i = 0; i < lagsS.length; i++) {
            if (!Double.isFinite(lagsS[i]) || (i > 0 && lagsS[i] < lagsS[i - 1])) {
                throw new IllegalArgumentException("load pattern lags must be finite and ascending, at index " + i);
            }
            if (!(values[i] >= 0.0 && values[i] <= 1.0)) {
                throw new IllegalArgumentException("load pattern values must lie in [0, 1], got " + values[i]
                        + " at index " + i);
            }
        }
    }

    /** Lags, s (copy). */
    @Override
    public double[] lagsS() {
        return lagsS.clone();
    }

    /** Values in [0, 1] (copy). */
    @Override
    public double[] values() {
        return values.clone();
    }

    /** Number of entries. */
    public int size() {
        return lagsS.length;
    }

    /** Lag of entry i, s. */
    public double lagS(int i) {
        return lagsS[i];
    }

    /** Value of entry i. */
    public double value(int i) {
        return values[i];
    }

    /** The last lag, s: how far back the pattern reaches. */
    public double lengthS() {
        return lagsS[lagsS.length - 1];
    }

    /** u at {@code lagS} &ge; 0, by linear interpolation; see the class comment for jumps. */
    public double u(double lagS) {
        int n = lagsS.length;
        if (lagS <= 0.0) {
            return values[0];
        }
        if (lagS >= lagsS[n - 1]) {
            return lagS == lagsS[n - 1] ? values[firstAt(n - 1)] : values[n - 1];
        }
        int lo = 0;
        int hi = n - 1; // lagsS[lo] < lag <= lagsS[hi] after the search
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (lagsS[mid] < lagS) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        if (lagsS[hi] == lagS) {
            return values[firstAt(hi)];
        }
        double f = (lagS - lagsS[lo]) / (lagsS[hi] - lagsS[lo]);
        return values[lo] + f * (values[hi] - values[lo]);
    }

    private int firstAt(int i) {
        while (i > 0 && lagsS[i - 1] == lagsS[i]) {
            i--;
        }
        return i;
    }

    /** The largest |du/dlag| over the pattern's sloped segments (jumps excluded), 1/s. */
    public double maxSlopePerS() {
        double m = 0;
        for (int i = 1; i < lagsS.length; i++) {
            double d = lagsS[i] - lagsS[i - 1];
            if (d > 0) {
                m = Math.max(m, Math.abs(values[i] - values[i - 1]) / d);
            }
        }
        return m;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof LoadPattern p && Arrays.equals(lagsS, p.lagsS) && Arrays.equals(values, p.values);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(lagsS) + Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return "LoadPattern[" + lagsS.length + " entries over " + lengthS() + " s]";
    }
}
