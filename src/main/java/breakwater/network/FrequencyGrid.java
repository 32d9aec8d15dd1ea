package breakwater.network;

import breakwater.scenario.Band;

/**
 * Frequencies at which impedance is evaluated, ascending, logarithmically spaced.
 * The array is owned by the grid: callers must not modify what {@link #frequenciesHz()} returns.
 */
public record FrequencyGrid(double[] frequenciesHz) {

    /**
     * Default density for reports and checks (docs/network-model.md#frequency-grids: 200 points per decade): steps of 1.16 % in
     * frequency, so every anti-resonance of Q up to about 40 (half-power width f0/Q) spans at least two
     * points and is seen as a local maximum; its exact peak is then refined against the network
     * ({@link ImpedanceAnalysis}).
     */
    public static final int DEFAULT_POINTS_PER_DECADE = 200;

    /**
     * Slack on the number of steps, in steps: a band whose decades × density is a whole number, but comes
     * out a hair above it in floating point, gets no extra point.
     */
    private static final double COUNT_ROUNDING = 1e-9;

    /** {@link #aroundBand} widens the band by this factor at each end (one decade). */
    private static final double BAND_WIDENING = 10.0;

    public FrequencyGrid {
        if (frequenciesHz.length < 2) {
            throw new IllegalArgumentException("a grid needs at least 2 frequencies");
        }
        for (int i = 0; i < frequenciesHz.length; i++) {
            if (!(frequenciesHz[i] > 0) || (i > 0 && !(frequenciesHz[i] > frequenciesHz[i - 1]))) {
                throw new IllegalArgumentException("grid frequencies must be > 0 and strictly ascending");
            }
        }
    }

    /**
     * {@code pointsPerDecade} points per decade from {@code fromHz} to {@code toHz}, both ends included:
     * f_k = from · 10^(k / pointsPerDecade), the last point clamped to {@code toHz}.
     */
    public static FrequencyGrid logarithmic(double fromHz, double toHz, int pointsPerDecade) {
        if (!(fromHz > 0) || !(toHz > fromHz) || pointsPerDecade < 1) {
            throw new IllegalArgumentException("need 0 < from < to and pointsPerDecade >= 1");
        }
        double decades = Math.log10(toHz / fromHz);
        int n = (int) Math.ceil(decades * pointsPerDecade - COUNT_ROUNDING) + 1;
        n = Math.max(n, 2);
        double[] f = new double[n];
        for (int k = 0; k < n - 1; k++) {
            f[k] = fromHz * Math.pow(10.0, (double) k / pointsPerDecade);
        }
        f[n - 1] = toHz;
        if (!(f[n - 1] > f[n - 2])) { // rounding put the last regular point on top of toHz
            double[] g = new double[n - 1];
            System.arraycopy(f, 0, g, 0, n - 2);
            g[n - 2] = toHz;
            f = g;
        }
        return new FrequencyGrid(f);
    }

    /** The band widened by one decade each side, at {@code pointsPerDecade}. */
    public static FrequencyGrid aroundBand(Band band, int pointsPerDecade) {
        return logarithmic(band.fromHz() / BAND_WIDENING, band.toHz() * BAND_WIDENING, pointsPerDecade);
    }

    public int size() {
        return frequenciesHz.length;
    }

    public double at(int i) {
        return frequenciesHz[i];
    }
}
