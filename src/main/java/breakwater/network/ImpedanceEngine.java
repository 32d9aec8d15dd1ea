package breakwater.network;

import java.util.List;

/**
 * Fast impedance sweeps for many banks drawn from the same parts on the same network, as the solver needs.
 *
 * <p>Everything that does not depend on the counts is computed once per frequency: the admittance of the
 * regulator plus the fixed board branches (plane, and die without a package), the package impedance, the
 * fixed load-node admittance, and the admittance Y₁ of ONE part of each candidate type. A bank with counts
 * n_p then has Y_board = Y_fixed + Σ n_p·Y₁,p, which is exact: n identical branches in parallel have n
 * times the admittance of one (docs/network-model.md#the-fast-per-part-engine). Results agree with {@link PowerNetwork#impedance} to
 * rounding (tested).
 */
public final class ImpedanceEngine {
    private final FrequencyGrid grid;
    private final int parts;
    private final boolean hasPackage;
    private final double[] fixedBoardRe;
    private final double[] fixedBoardIm;
    private final double[] packageRe;
    private final double[] packageIm;
    private final double[] fixedLoadRe;
    private final double[] fixedLoadIm;
    /** [part][frequency] admittance of a single part. */
    private final double[][] unitRe;
    private final double[][] unitIm;

    /**
     * @param fixedNetwork the network with an empty bank (regulator, plane, package, die)
     * @param unitParts    one branch per candidate part type, for a single part (count 1)
     * @param grid         frequencies to sweep
     */
    public ImpedanceEngine(PowerNetwork fixedNetwork, List<SeriesBranch> unitParts, FrequencyGrid grid) {
        this.grid = grid;
        this.parts = unitParts.size();
        this.hasPackage = fixedNetwork.hasPackage();
        int n = grid.size();
        fixedBoardRe = new double[n];
        fixedBoardIm = new double[n];
        packageRe = new double[n];
        packageIm = new double[n];
        fixedLoadRe = new double[n];
        fixedLoadIm = new double[n];
        unitRe = new double[parts][n];
        unitIm = new double[parts][n];
        double[] y = new double[2];
        for (int k = 0; k < n; k++) {
            double w = 2 * Math.PI * grid.at(k);
            double r = fixedNetwork.regulatorResistanceOhms();
            double x = w * fixedNetwork.regulatorInductanceH();
            double m = r * r + x * x;
            double yr = r / m;
            double yi = -x / m;
            for (SeriesBranch b : fixedNetwork.boardBranches()) {
                b.admittance(w, y);
                yr += y[0];
                yi += y[1];
            }
            fixedBoardRe[k] = yr;
            fixedBoardIm[k] = yi;
            packageRe[k] = fixedNetwork.packageResistanceOhms();
            packageIm[k] = w * fixedNetwork.packageInductanceH();
            double lr = 0;
            double li = 0;
            for (SeriesBranch b : fixedNetwork.loadBranches()) {
                b.admittance(w, y);
                lr += y[0];
                li += y[1];
            }
            fixedLoadRe[k] = lr;
            fixedLoadIm[k] = li;
            for (int p = 0; p < parts; p++) {
                unitParts.get(p).admittance(w, y);
                unitRe[p][k] = y[0];
                unitIm[p][k] = y[1];
            }
        }
    }

    public FrequencyGrid grid() {
        return grid;
    }

    public int partCount() {
        return parts;
    }

    /** Z at the load node for the bank with {@code counts[p]} parts of type p, into {@code re}/{@code im}. */
    public void sweep(int[] counts, double[] re, double[] im) {
        if (counts.length != parts) {
            throw new IllegalArgumentException("expected " + parts + " counts, got " + counts.length);
        }
        int n = grid.size();
        for (int k = 0; k < n; k++) {
            double yr = fixedBoardRe[k];
            double yi = fixedBoardIm[k];
            for (int p = 0; p < parts; p++) {
                int c = counts[p];
                if (c != 0) {
                    yr += c * unitRe[p][k];
                    yi += c * unitIm[p][k];
                }
            }
            double m = yr * yr + yi * yi;
            double zr = yr / m;
            double zi = -yi / m;
            if (hasPackage) {
                zr += packageRe[k];
                zi += packageIm[k];
                m = zr * zr + zi * zi;
                yr = zr / m + fixedLoadRe[k];
                yi = -zi / m + fixedLoadIm[k];
                m = yr * yr + yi * yi;
                zr = yr / m;
                zi = -yi / m;
            }
            re[k] = zr;
            im[k] = zi;
        }
    }

    /** |Z| for the bank, into {@code magnitude} (length = grid size). */
    public void magnitudes(int[] counts, double[] re, double[] im, double[] magnitude) {
        sweep(counts, re, im);
        for (int k = 0; k < magnitude.length; k++) {
            magnitude[k] = Math.sqrt(re[k] * re[k] + im[k] * im[k]);
        }
    }
}
