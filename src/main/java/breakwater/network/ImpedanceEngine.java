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
 *
 * <p>With placement regions (docs/network-model.md#placement-regions) each candidate belongs to one region of
 * the fixed network, or to the board node: a region's node sums its parts in the same way, Y_r = Y_r,fixed +
 * Σ n_p·Y₁,p, and reaches the board node through its spreading path, y = Y_r/(1 + Y_r·(R_r + jωL_r)).
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
    /** Candidate p's region (index into the fixed network's regions), or −1 for the board node. */
    private final int[] regionOf;
    private final int regionCount;
    /** [region][frequency] spreading path impedance R_r + jωL_r, and the region's fixed admittance. */
    private final double[][] pathRe;
    private final double[][] pathIm;
    private final double[][] fixedRegionRe;
    private final double[][] fixedRegionIm;
    private final double[] scratchRe;
    private final double[] scratchIm;
    private final double[] pathSum = new double[2];
    /** Scratch: the candidates in use in the bank being swept. */
    private final int[] used;

    /**
     * @param fixedNetwork the network with an empty bank (regulator, plane, package, die)
     * @param unitParts    one branch per candidate part type, for a single part (count 1)
     * @param grid         frequencies to sweep
     */
    public ImpedanceEngine(PowerNetwork fixedNetwork, List<SeriesBranch> unitParts, FrequencyGrid grid) {
        this(fixedNetwork, unitParts, new int[unitParts.size()], grid, true);
    }

    /**
     * @param fixedNetwork the network with an empty bank; its regions (each maybe empty) give the paths
     * @param unitParts    one branch per candidate, for a single part (count 1)
     * @param regionOf     per candidate, the index of its region in {@code fixedNetwork.regions()}, or −1 for
     *                     the board node
     * @param grid         frequencies to sweep
     */
    public ImpedanceEngine(PowerNetwork fixedNetwork, List<SeriesBranch> unitParts, int[] regionOf, FrequencyGrid grid) {
        this(fixedNetwork, unitParts, regionOf.clone(), grid, false);
    }

    private ImpedanceEngine(PowerNetwork fixedNetwork, List<SeriesBranch> unitParts, int[] regionOf, FrequencyGrid grid,
                            boolean boardOnly) {
        if (regionOf.length != unitParts.size()) {
            throw new IllegalArgumentException("one region per candidate expected");
        }
        if (boardOnly) {
            java.util.Arrays.fill(regionOf, -1);
        }
        List<RegionPath> regions = fixedNetwork.regions();
        for (int r : regionOf) {
            if (r < -1 || r >= regions.size()) {
                throw new IllegalArgumentException("no region " + r + " in the network");
            }
        }
        this.regionOf = regionOf;
        this.regionCount = regions.size();
        this.grid = grid;
        this.parts = unitParts.size();
        this.used = new int[parts];
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
        pathRe = new double[regionCount][n];
        pathIm = new double[regionCount][n];
        fixedRegionRe = new double[regionCount][n];
        fixedRegionIm = new double[regionCount][n];
        scratchRe = new double[regionCount];
        scratchIm = new double[regionCount];
        double[] y = new double[2];
        for (int k = 0; k < n; k++) {
            double wk = 2 * Math.PI * grid.at(k);
            for (int r = 0; r < regionCount; r++) {
                RegionPath path = regions.get(r);
                pathRe[r][k] = path.resistanceOhms();
                pathIm[r][k] = wk * path.inductanceH();
                for (SeriesBranch b : path.branches()) {
                    b.admittance(wk, y);
                    fixedRegionRe[r][k] += y[0];
                    fixedRegionIm[r][k] += y[1];
                }
            }
        }
        for (int k = 0; k < n; k++) {
            double w = 2 * Math.PI * grid.at(k);
            fixedNetwork.fixedBoardAdmittance(w, y);
            fixedBoardRe[k] = y[0];
            fixedBoardIm[k] = y[1];
            packageRe[k] = fixedNetwork.packageResistanceOhms();
            packageIm[k] = w * fixedNetwork.packageInductanceH();
            fixedNetwork.loadAdmittance(w, y);
            fixedLoadRe[k] = y[0];
            fixedLoadIm[k] = y[1];
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
        // only the candidates in use: a bank holds a handful of a large catalog's parts
        int inUse = 0;
        for (int p = 0; p < parts; p++) {
            if (counts[p] != 0) {
                used[inUse++] = p;
            }
        }
        for (int k = 0; k < n; k++) {
            double yr = fixedBoardRe[k];
            double yi = fixedBoardIm[k];
            if (regionCount == 0) {
                for (int u = 0; u < inUse; u++) {
                    int p = used[u];
                    int c = counts[p];
                    yr += c * unitRe[p][k];
                    yi += c * unitIm[p][k];
                }
            } else {
                for (int r = 0; r < regionCount; r++) {
                    scratchRe[r] = fixedRegionRe[r][k];
                    scratchIm[r] = fixedRegionIm[r][k];
                }
                for (int u = 0; u < inUse; u++) {
                    int p = used[u];
                    int c = counts[p];
                    {
                        int r = regionOf[p];
                        if (r < 0) {
                            yr += c * unitRe[p][k];
                            yi += c * unitIm[p][k];
                        } else {
                            scratchRe[r] += c * unitRe[p][k];
                            scratchIm[r] += c * unitIm[p][k];
                        }
                    }
                }
                pathSum[0] = yr;
                pathSum[1] = yi;
                for (int r = 0; r < regionCount; r++) {
                    if (scratchRe[r] != 0.0 || scratchIm[r] != 0.0) {
                        RegionPath.addBehindPath(scratchRe[r], scratchIm[r], pathRe[r][k], pathIm[r][k], pathSum);
                    }
                }
                yr = pathSum[0];
                yi = pathSum[1];
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
