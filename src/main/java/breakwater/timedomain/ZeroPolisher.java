package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;

import java.util.List;
import java.util.Optional;

/**
 * The poles of Z as zeros of the load-node admittance Y(s) (circuit theory: Z = 1/Y has a simple pole
 * where Y has a simple zero), polished to full double precision from first guesses.
 *
 * <ul>
 * <li>Every guess is polished by Newton's method on Y(s) = 0 ({@link Ladder}, closed-form Y'). Guesses
 *     that are not zeros of Y (modes that the load cannot see, e.g. two identical branches exchanging
 *     current, or the pole–zero cancellation of a constant-resistance network) do not converge and are
 *     dropped.</li>
 * <li>Residues r_i = 1/Y'(p_i).</li>
 * <li>With guesses from a neighbour's poles ({@link #warmStart}), a guess that found no zero, or one
 *     already found, is tried again by Newton's method with implicit deflation of the zeros found
 *     (Maehly's correction, {@link #deflatedNewton}), which cannot return to those; each zero so found is
 *     polished on Y itself.</li>
 * </ul>
 * Zeros are returned once per conjugate pair (Im p &ge; 0), ordered by |p| descending.
 */
final class ZeroPolisher {

    /**
     * Iteration cap of Newton's method, plain and deflated. From a pencil eigenvalue the quadratic phase
     * takes a handful of steps; the cap leaves room for a slow start from a neighbour's pole, and a guess
     * still moving after it is taken as having found no zero of Y (as for a mode the load cannot see,
     * whose guess has no zero to converge to).
     */
    private static final int MAX_ITERATIONS = 60;

    /**
     * Newton stops when the step is below this fraction of |s|: some fifty ulps, where the steps are
     * rounding noise. Smaller might never be reached; larger would stop short of full precision, which the
     * warm start needs to reproduce the cold model ({@code WarmStartTest}, poles equal to 1e-9).
     */
    private static final double STEP_TOLERANCE = 1e-14;

    /**
     * Newton also stops when |Y| is below this fraction of the scale Σ|y_i| of the terms summed into it:
     * Y is then zero to rounding and the next step would be noise.
     */
    private static final double VANISHED_RESIDUAL = 1e-15;

    /**
     * A converged point is accepted as a zero of Y only if |Y| there is below this fraction of the scale
     * of its terms. A true zero leaves |Y| at rounding level, many decades lower; a point where Newton only
     * stalled (a pole–zero cancellation of a hidden mode) leaves far more, so the margin is wide both ways
     * ({@code PoleResidueModelTest.constantResistanceNetworkIsExactlyResistive},
     * {@code WarmStartTest.aHintWithAHiddenModeIsNotUsed}).
     */
    private static final double ACCEPTED_RESIDUAL = 1e-9;

    /**
     * A zero whose imaginary part is below this fraction of |s| is real: Newton reached a real zero from a
     * complex guess and left a rounding-level imaginary part. It is polished again on the real axis and
     * stored once (weight 1); a genuine pair this close to the axis (damping within 1e-9 of critical)
     * cannot be told from a double real pole in double precision anyway.
     */
    private static final double REAL_AXIS_TOLERANCE = 1e-9;

    /**
     * Two zeros closer than this fraction of |s| are the same zero found from two guesses (two polishings
     * of one zero agree to rounding, far closer); the second guess counts as having found none. Distinct
     * zeros this close would be too ill-conditioned to separate; a zero missed that way is caught by the
     * self-checks ({@link ModelSelfCheck}).
     */
    private static final double DUPLICATE_TOLERANCE = 1e-7;

    /**
     * The deflated iteration stops when its step is below this fraction of |s|: it only has to land
     * near a new zero, which plain Newton then polishes to full precision; the deflation sum over the zeros
     * found adds rounding, so it is held looser than {@link #STEP_TOLERANCE}.
     */
    private static final double DEFLATED_STEP_TOLERANCE = 1e-10;

    private ZeroPolisher() {
    }

    /**
     * Zeros of Y found and their residues, ordered by |p| descending; each conjugate pair once, with
     * Im p &gt; 0. The arrays are per-mode vectors of one length.
     */
    record Zeros(double[] poleRe, double[] poleIm, double[] residueRe, double[] residueIm) {

        /** Number of zeros stored (real ones plus conjugate pairs, each pair once). */
        int count() {
            return poleRe.length;
        }
    }

    /**
     * The model of {@code network} from the poles of {@code hint}, a model of a network of the same circuit
     * structure (the same branches, only other element values: the solver's neighbouring banks), as
     * Newton's first guesses. Taken only when every guess converges to its own zero of Y, the zeros found
     * number the circuit's degree (the count of finite eigenvalues of the pencil, which for positive
     * elements depends on the structure alone) and the self-checks pass; empty otherwise, or when the
     * structures differ.
     */
    static Optional<PoleResidueModel> warmStart(PoleResidueModel hint, PowerNetwork network) {
        long[] shape = structure(network);
        int degree = hint.degree();
        if (java.util.Arrays.equals(shape, hint.structure()) && hint.weightedCount() == degree && hint.modes > 0) {
            double[] cand = new double[2 * hint.modes];
            for (int k = 0; k < hint.modes; k++) {
                cand[2 * k] = hint.pr[k];
                cand[2 * k + 1] = hint.pi[k];
            }
            try {
                PoleResidueModel model = PoleResidueModel.assemble(network,
                        polish(new Ladder(network), cand, degree, true), degree, true);
                if (model.weightedCount() == degree) {
                    ModelSelfCheck.check(model, network);
                    return Optional.of(model);
                }
            } catch (ModelException notFromHere) {
                // fall through: the eigenvalue search decides
            }
        }
        return Optional.empty();
    }

    /**
     * Zeros polished from first guesses {@code cand} (interleaved re/im; guesses with Im &lt; 0 are left to
     * their conjugates), with their residues, ordered by |p| descending. With {@code retry} (first guesses
     * from a neighbour's poles, where every guess should find a zero), guesses that found none or one
     * already found are tried again, once, by {@link #deflatedNewton}, until {@code degree} poles (each
     * conjugate counted) are found.
     */
    static Zeros polish(Ladder ladder, double[] cand, int degree, boolean retry) {
        int nc = cand.length / 2;
        double[] pr = new double[nc];
        double[] pi = new double[nc];
        double[] rr = new double[nc];
        double[] ri = new double[nc];
        double[] root = new double[2];
        int m = 0;
        int[] missed = new int[nc];
        int nm = 0;
        int weighted = 0;
        for (int pass = 0; pass < 2; pass++) {
            int count = pass == 0 ? nc : nm;
            if (pass == 1 && !(retry && weighted < degree)) {
                break;
            }
            for (int g = 0; g < count && (pass == 0 || weighted < degree); g++) {
                int c = pass == 0 ? g : missed[g];
                double sr = cand[2 * c];
                double si = cand[2 * c + 1];
                if (si < 0) {
                    continue; // the conjugate is handled with its partner
                }
                if (pass == 1) {
                    if (!deflatedNewton(ladder, sr, si, pr, pi, m, root)) {
                        continue;
                    }
                    sr = root[0];
                    si = root[1];
                }
                if (!newton(ladder, sr, si, root)) {
                    if (pass == 0) {
                        missed[nm++] = c; // tried again once, in the second pass
                    }
                    continue;
                }
                double qr = root[0];
                double qi = root[1];
                if (qi * qi <= sq(REAL_AXIS_TOLERANCE) * (qr * qr + qi * qi)) {
                    if (!newton(ladder, qr, 0.0, root)) {
                        if (pass == 0) {
                            missed[nm++] = c; // tried again once, in the second pass
                        }
                        continue;
                    }
                    qr = root[0];
                    qi = 0.0;
                } else if (qi < 0) {
                    qi = -qi; // Newton went to the conjugate root: store the upper one
                }
                boolean duplicate = false;
                for (int k = 0; k < m; k++) {
                    if (sq(pr[k] - qr) + sq(pi[k] - qi) <= sq(DUPLICATE_TOLERANCE) * (qr * qr + qi * qi)) {
                        duplicate = true;
                        break;
                    }
                }
                if (duplicate) {
                    if (pass == 0) {
                        missed[nm++] = c; // tried again once, in the second pass
                    }
                    continue;
                }
                ladder.eval(qr, qi);
                // r = 1/Y'(p)
                double dm = 1.0 / (ladder.dr * ladder.dr + ladder.di * ladder.di);
                pr[m] = qr;
                pi[m] = qi;
                rr[m] = ladder.dr * dm;
                ri[m] = qi == 0.0 ? 0.0 : -ladder.di * dm;
                m++;
                weighted += qi == 0.0 ? 1 : 2;
            }
        }
        // order by |p| descending
        for (int i = 1; i < m; i++) {
            for (int j = i; j > 0 && pr[j] * pr[j] + pi[j] * pi[j] > pr[j - 1] * pr[j - 1] + pi[j - 1] * pi[j - 1]; j--) {
                swap(pr, j);
                swap(pi, j);
                swap(rr, j);
                swap(ri, j);
            }
        }
        return new Zeros(trim(pr, m), trim(pi, m), trim(rr, m), trim(ri, m));
    }

    /**
     * Newton's method on Y(s) = 0 from (sr, si), quadratically convergent at a simple zero. Succeeds when
     * the step falls below {@value #STEP_TOLERANCE}·|s| (or Y vanishes to {@value #VANISHED_RESIDUAL} of
     * the scale of its terms) and the final |Y| is below {@value #ACCEPTED_RESIDUAL} of that scale; the root
     * goes to {@code out}.
     */
    static boolean newton(Ladder ladder, double sr, double si, double[] out) {
        boolean stepConverged = false;
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            ladder.eval(sr, si);
            double yr = ladder.yr;
            double yi = ladder.yi;
            double dr = ladder.dr;
            double di = ladder.di;
            double dm = dr * dr + di * di;
            if (!(dm > 0) || !Double.isFinite(dm) || !Double.isFinite(yr) || !Double.isFinite(yi)) {
                return false;
            }
            if (Math.abs(yr) + Math.abs(yi) <= VANISHED_RESIDUAL * ladder.scale) {
                stepConverged = true;
                break;
            }
            // delta = Y / Y'
            double xr = (yr * dr + yi * di) / dm;
            double xi = (yi * dr - yr * di) / dm;
            sr -= xr;
            si -= xi;
            if (xr * xr + xi * xi <= sq(STEP_TOLERANCE) * (sr * sr + si * si)) {
                stepConverged = true;
                break;
            }
        }
        if (!stepConverged) {
            return false;
        }
        ladder.eval(sr, si);
        if (!(Math.abs(ladder.yr) + Math.abs(ladder.yi) <= ACCEPTED_RESIDUAL * ladder.scale)) {
            return false;
        }
        out[0] = sr;
        out[1] = si;
        return true;
    }

    /**
     * Newton's method on Y(s)/Π(s − z_k) over the zeros z_k found so far and their conjugates: the step
     * Y/(Y' − Y·Σ 1/(s − z_k)) (Maehly's correction) keeps it away from them. Succeeds when the step falls
     * below {@value #DEFLATED_STEP_TOLERANCE}·|s|, leaving the point (to be polished on Y itself) in
     * {@code out}; a point within {@value #REAL_AXIS_TOLERANCE}·|s| of the real axis is put on it.
     */
    static boolean deflatedNewton(Ladder ladder, double sr, double si, double[] zr, double[] zi, int m,
                                  double[] out) {
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            ladder.eval(sr, si);
            double yr = ladder.yr;
            double yi = ladder.yi;
            // Σ 1/(s − z) over the found zeros and their conjugates
            double sumR = 0;
            double sumI = 0;
            for (int k = 0; k < m; k++) {
                double ar = sr - zr[k];
                double ai = si - zi[k];
                double d = ar * ar + ai * ai;
                sumR += ar / d;
                sumI -= ai / d;
                if (zi[k] != 0.0) {
                    double br = sr - zr[k];
                    double bi = si + zi[k];
                    double e = br * br + bi * bi;
                    sumR += br / e;
                    sumI -= bi / e;
                }
            }
            // den = Y' − Y·sum
            double dr = ladder.dr - (yr * sumR - yi * sumI);
            double di = ladder.di - (yr * sumI + yi * sumR);
            double dm = dr * dr + di * di;
            if (!(dm > 0) || !Double.isFinite(dm) || !Double.isFinite(yr) || !Double.isFinite(yi)) {
                return false;
            }
            double xr = (yr * dr + yi * di) / dm;
            double xi = (yi * dr - yr * di) / dm;
            sr -= xr;
            si -= xi;
            if (xr * xr + xi * xi <= sq(DEFLATED_STEP_TOLERANCE) * (sr * sr + si * si)) {
                out[0] = sr;
                out[1] = si * si <= sq(REAL_AXIS_TOLERANCE) * (sr * sr + si * si) ? 0.0 : si;
                return true;
            }
        }
        return false;
    }

    /**
     * The circuit's structure: branch counts, whether there is a package, and which elements are zero.
     * Two networks with equal structures have the same degree.
     */
    static long[] structure(PowerNetwork net) {
        List<SeriesBranch> all = new java.util.ArrayList<>(net.boardNodeBranches());
        all.addAll(net.loadBranches());
        List<breakwater.network.RegionPath> regions = net.spreadRegions();
        for (breakwater.network.RegionPath r : regions) {
            all.addAll(r.branches());
        }
        int n = all.size();
        long[] s = new long[3 + regions.size() + (n * 3 + 63) / 64];
        s[0] = ((long) net.boardNodeBranches().size() << 32) | net.loadBranches().size();
        s[1] = (net.hasPackage() ? 1 : 0) | (net.regulatorInductanceH() > 0 ? 2 : 0)
                | (net.regulatorResistanceOhms() > 0 ? 4 : 0) | (net.packageInductanceH() > 0 ? 8 : 0)
                | (net.packageResistanceOhms() > 0 ? 16 : 0);
        s[2] = regions.size();
        for (int r = 0; r < regions.size(); r++) {
            breakwater.network.RegionPath p = regions.get(r);
            s[3 + r] = ((long) p.branches().size() << 2) | (p.inductanceH() > 0 ? 2 : 0) | (p.resistanceOhms() > 0 ? 1 : 0);
        }
        int bit = 0;
        int base = 3 + regions.size();
        for (int k = 0; k < n; k++) {
            SeriesBranch b = all.get(k);
            long flags = (b.resistanceOhms() > 0 ? 1 : 0) | (b.inductanceH() > 0 ? 2 : 0)
                    | (b.capacitanceF() > 0 ? 4 : 0);
            s[base + bit / 64] |= flags << (bit % 64);
            bit += 3;
        }
        return s;
    }

    private static void swap(double[] a, int j) {
        double t = a[j];
        a[j] = a[j - 1];
        a[j - 1] = t;
    }

    private static double[] trim(double[] a, int m) {
        return a.length == m ? a : java.util.Arrays.copyOf(a, m);
    }

    /**
     * x²: tolerances are compared on squared magnitudes (|a| ≤ t·|b| as a² ≤ t²·b²), which avoids the slow
     * overflow-safe {@code Math.hypot}; pole and step magnitudes here lie far inside the range where the
     * squares neither overflow nor underflow (|s| between 1e-3 and 1e13 rad/s).
     */
    private static double sq(double x) {
        return x * x;
    }
}
