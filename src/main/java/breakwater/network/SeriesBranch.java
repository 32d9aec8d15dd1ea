package breakwater.network;

import java.util.Objects;

/**
 * A shunt branch R + sL + 1/(sC) from a node to ground: a capacitor with its ESR and total series
 * inductance (own ESL plus mounting), the plane, or the die. n identical parts in parallel are one branch
 * with R/n, L/n and n·C (docs/network-model.md#the-lumped-network), see {@link #parallel(int)}.
 *
 * @param label          for reports and messages ("plane", "die", a part name)
 * @param resistanceOhms series resistance, &ge; 0
 * @param inductanceH    series inductance, &ge; 0 (0 only for plane and die)
 * @param capacitanceF   capacitance, &gt; 0
 */
public record SeriesBranch(String label, double resistanceOhms, double inductanceH, double capacitanceF) {

    /**
     * |Z|² of a branch is clamped to at least this, Ω²: only a lossless branch exactly at resonance gets
     * there, and the admittance is then huge but finite instead of a division by zero.
     */
    private static final double MIN_MAGNITUDE_SQUARED = 1e-300;

    public SeriesBranch {
        Objects.requireNonNull(label, "label");
        if (!(resistanceOhms >= 0) || !Double.isFinite(resistanceOhms)) {
            throw new IllegalArgumentException(label + ": resistance must be >= 0");
        }
        if (!(inductanceH >= 0) || !Double.isFinite(inductanceH)) {
            throw new IllegalArgumentException(label + ": inductance must be >= 0");
        }
        if (!(capacitanceF > 0) || !Double.isFinite(capacitanceF)) {
            throw new IllegalArgumentException(label + ": capacitance must be > 0");
        }
    }

    /** n identical branches in parallel as one: R/n, L/n, n·C. */
    public SeriesBranch parallel(int n) {
        if (n < 1) {
            throw new IllegalArgumentException("parallel count must be >= 1");
        }
        return new SeriesBranch(label, resistanceOhms / n, inductanceH / n, capacitanceF * n);
    }

    /** Series resonance 1/(2π√(LC)) in Hz; infinite when L = 0. */
    public double seriesResonanceHz() {
        return 1.0 / (2 * Math.PI * Math.sqrt(inductanceH * capacitanceF));
    }

    /**
     * Admittance at angular frequency ω &gt; 0, written to {@code out[0]} (real) and {@code out[1]} (imaginary).
     * Y = 1/Z with Z = R + j(ωL − 1/(ωC)), computed as conj(Z)/|Z|². A lossless branch exactly at
     * resonance has |Z| = 0; it is clamped to 1e-300 Ω so the admittance is huge but finite.
     */
    public void admittance(double omega, double[] out) {
        double x = omega * inductanceH - 1.0 / (omega * capacitanceF);
        double r = resistanceOhms;
        double mag2 = r * r + x * x;
        if (mag2 < MIN_MAGNITUDE_SQUARED) {
            mag2 = MIN_MAGNITUDE_SQUARED;
        }
        out[0] = r / mag2;
        out[1] = -x / mag2;
    }
}
