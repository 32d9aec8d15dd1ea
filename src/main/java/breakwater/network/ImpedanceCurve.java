package breakwater.network;

/**
 * Z(f) at the load node on a grid. Arrays are owned by the curve; do not modify them.
 *
 * @param frequenciesHz ascending frequencies
 * @param realOhms      Re Z
 * @param imagOhms      Im Z
 */
public record ImpedanceCurve(double[] frequenciesHz, double[] realOhms, double[] imagOhms) {

    public ImpedanceCurve {
        if (frequenciesHz.length != realOhms.length || frequenciesHz.length != imagOhms.length) {
            throw new IllegalArgumentException("frequency, real and imaginary arrays must have one length");
        }
    }

    /** Sweeps {@code network} over {@code grid} (the slow, allocation-free reference path). */
    public static ImpedanceCurve sweep(PowerNetwork network, FrequencyGrid grid) {
        int n = grid.size();
        double[] re = new double[n];
        double[] im = new double[n];
        double[] z = new double[2];
        for (int i = 0; i < n; i++) {
            network.impedance(grid.at(i), z);
            re[i] = z[0];
            im[i] = z[1];
        }
        return new ImpedanceCurve(grid.frequenciesHz(), re, im);
    }

    public int size() {
        return frequenciesHz.length;
    }

    public double frequencyHz(int i) {
        return frequenciesHz[i];
    }

    public double magnitudeOhms(int i) {
        return Math.hypot(realOhms[i], imagOhms[i]);
    }

    /** Phase of Z in degrees, in (−180, 180]. */
    public double phaseDegrees(int i) {
        return Math.toDegrees(Math.atan2(imagOhms[i], realOhms[i]));
    }
}
