package breakwater.design;

import breakwater.network.NetworkBuilder;
import breakwater.network.PartBranches;
import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import breakwater.network.FrequencyGrid;
import breakwater.scenario.Rail;
import breakwater.scenario.Scenario;

import java.util.Arrays;
import java.util.Optional;

/**
 * A lower bound on the worst case of EVERY bank the search may build, to tell "no bank can meet the spec"
 * from "the search found none" (docs/worst-case.md#a-bound-over-every-bank).
 *
 * <p>At one frequency f, a bank of n_i parts of each candidate adds the admittance Y = Σ n_i·y_i(f) at the
 * board node. Over all counts 0 ≤ n_i ≤ max_i with Σ n_i ≤ the board's max_parts these Y fill a convex
 * polygon (its other limits are dropped: a larger set, so the bound stays a bound); an outer polygon
 * from {@value #DIRECTIONS} support lines contains it. |Z| at the load is a Möbius map of Y, so its least
 * value over the polygon is found exactly on the polygon's edges (maximum-modulus principle applied to the
 * load admittance; a ratio of quadratics along each edge). Call it Z_min(f): no bank has less.
 *
 * <p>A load swinging between I_min and I_max as a square wave of period 1/f with ramps of the edge time
 * t_e is a pattern every bank must survive. Its fundamental has the amplitude (2ΔI/π)·sinc(π f t_e)
 * (Fourier series of a trapezoidal wave), so the voltage's fundamental has that times |Z(f)|; a periodic
 * signal's peak is at least π/4 of its fundamental's amplitude (|c_1| ≤ (2/π)·max|x|, with equality for a
 * square wave), and the wave's half-period symmetry puts that peak on both sides of the mean, which
 * itself sits ΔI·Z(0)/2 below the I_min operating point. So every bank droops at least
 * ΔI/2·(Z(0) + sinc·Z_min(f)) and overshoots at least ΔI/2·(sinc·Z_min(f) − Z(0)). Where the scenario
 * requires the target impedance, Z_min(f) above Z_t anywhere in the band rules every bank out as well.
 *
 * <p>Computed for networks without placement regions (a region's parts sit behind their own path, and the
 * set of their admittances is no longer a polygon); with regions {@link #of} returns empty.
 *
 * @param outOfReach         whether the bound alone shows that no bank within the limits meets the spec
 * @param frequencyHz        the frequency where the bound comes nearest to (or beyond) a limit
 * @param leastImpedanceOhms Z_min there: no bank has a smaller |Z| at the load
 * @param droopAtLeastV      every bank's worst droop is at least this (below the I_min operating point)
 * @param allowedDroopV      the droop the limits allow
 * @param overshootAtLeastV  every bank's worst overshoot is at least this
 * @param allowedOvershootV  the overshoot the limits allow
 * @param byTarget           whether the required target impedance is what rules every bank out
 * @param targetOhms         the target impedance
 */
public record ReachBound(boolean outOfReach, double frequencyHz, double leastImpedanceOhms, double droopAtLeastV,
                         double allowedDroopV, double overshootAtLeastV, double allowedOvershootV, boolean byTarget,
                         double targetOhms) {
    /** Support lines of the outer polygon; it lies within a factor 1/cos(π/K) ≈ 1.005 of the true one. */
    static final int DIRECTIONS = 32;
    static final int POINTS_PER_DECADE = 25;

    /**
     * The bound for {@code candidates} with largest counts {@code maxCounts} under {@code evaluator}'s
     * scenario, footprint and limits; empty when the scenario has placement regions.
     */
    public static Optional<ReachBound> of(BankEvaluator evaluator, Candidates candidates, int[] maxCounts) {
        Scenario s = evaluator.scenario();
        if (!s.regions().isEmpty()) {
            return Optional.empty();
        }
        PowerNetwork fixed = NetworkBuilder.build(s, java.util.List.of(), evaluator.footprint());
        int n = candidates.size();
        SeriesBranch[] unit = new SeriesBranch[n];
        for (int i = 0; i < n; i++) {
            unit[i] = PartBranches.single(candidates.part(i), evaluator.footprint());
        }
        Rail rail = s.rail();
        double dI = rail.currentStepA();
        double te = rail.edgeTimeS();
        double z0 = fixed.dcResistanceOhms();
        double vop = evaluator.operatingPointV();
        double allowedDroop = vop - evaluator.limits().lowerV();
        double allowedOver = evaluator.limits().upperV() - vop;
        double zt = rail.targetImpedanceOhms();
        long budget = s.board().maxPartsLimit().isPresent() ? s.board().maxParts() : Long.MAX_VALUE;

        double lo = Math.max(1.0, s.band().fromHz() / 100);
        double hi = s.band().toHz() * 100;
        if (te > 0) {
            hi = Math.min(hi, 0.5 / te); // the trapezoid needs ramps no longer than half its period
        }
        if (!(hi > lo)) {
            hi = lo * 10;
        }
        double[] fs = FrequencyGrid.logarithmic(lo, hi, POINTS_PER_DECADE).frequenciesHz();
        ReachBound worst = null;
        double worstScore = Double.NEGATIVE_INFINITY;
        for (double f : fs) {
            double zMin = leastImpedanceAt(fixed, unit, maxCounts, budget, f);
            double sinc = te > 0 ? Math.abs(Math.sin(Math.PI * f * te) / (Math.PI * f * te)) : 1.0;
            double droop = dI / 2 * (z0 + sinc * zMin);
            double over = dI / 2 * (sinc * zMin - z0);
            boolean inBand = f >= s.band().fromHz() && f <= s.band().toHz();
            boolean target = s.requireTarget() && inBand && zMin > zt * (1 + 1e-9);
            // how far the bound reaches towards (or beyond) the nearest limit, as a share of it
            double score = Math.max(droop / allowedDroop, over / allowedOver);
            if (s.requireTarget() && inBand) {
                score = Math.max(score, zMin / zt);
            }
            if (score > worstScore) {
                worstScore = score;
                boolean out = droop > allowedDroop * (1 + 1e-9) || over > allowedOver * (1 + 1e-9) || target;
                worst = new ReachBound(out, f, zMin, droop, allowedDroop, over, allowedOver,
                        target && !(droop > allowedDroop * (1 + 1e-9) || over > allowedOver * (1 + 1e-9)), zt);
            }
        }
        return Optional.ofNullable(worst);
    }

    /**
     * The least |Z| at the load at {@code f} over every bank of {@code unit} parts with 0 … maxCounts[i] of
     * each and at most {@code budget} in all: the outer polygon of the banks' admittances from
     * {@value #DIRECTIONS} support lines, then {@link #leastImpedance(PowerNetwork, double, double[], double[])}.
     */
    static double leastImpedanceAt(PowerNetwork fixed, SeriesBranch[] unit, int[] maxCounts, long budget, double f) {
        int n = unit.length;
        boolean budgetBinds = budget < Arrays.stream(maxCounts).asLongStream().sum();
        double[] yRe = new double[n];
        double[] yIm = new double[n];
        double[] y = new double[2];
        double[] v = new double[n];
        long[] keys = new long[n];
        double[] vx = new double[DIRECTIONS];
        double[] vy = new double[DIRECTIONS];
        double[] h = new double[DIRECTIONS];
        double w = 2 * Math.PI * f;
        for (int i = 0; i < n; i++) {
            unit[i].admittance(w, y);
            yRe[i] = y[0];
            yIm[i] = y[1];
        }
        // support of the bank polygon in each direction θ: the most of Re(Y·e^{−jθ}) any counts reach
        for (int k = 0; k < DIRECTIONS; k++) {
            double th = 2 * Math.PI * k / DIRECTIONS;
            double c = Math.cos(th);
            double sn = Math.sin(th);
            double sum = 0;
            if (!budgetBinds) {
                for (int i = 0; i < n; i++) {
                    double vi = yRe[i] * c + yIm[i] * sn;
                    if (vi > 0) {
                        sum += maxCounts[i] * vi;
                    }
                }
            } else {
                // the positive values, largest first: sorted as primitive keys (the value's float bits
                // above the index; a positive float's bits order as the float does)
                int m = 0;
                for (int i = 0; i < n; i++) {
                    v[i] = yRe[i] * c + yIm[i] * sn;
                    if (v[i] > 0 && maxCounts[i] > 0) {
                        keys[m++] = ((long) Float.floatToIntBits((float) v[i]) << 32) | i;
                    }
                }
                Arrays.sort(keys, 0, m);
                long left = budget;
                for (int idx = m - 1; idx >= 0 && left > 0; idx--) {
                    int i = (int) keys[idx];
                    long take = Math.min(left, maxCounts[i]);
                    sum += take * v[i];
                    left -= take;
                }
                // the float order may swap values that agree to 1e-7: the sum can fall short of the
                // greatest by less than that share, so widen it (a larger polygon keeps the bound a bound)
                sum *= 1 + 1e-6;
            }
            h[k] = sum;
        }
        // the outer polygon's vertices: consecutive support lines meet
        for (int k = 0; k < DIRECTIONS; k++) {
            int k1 = (k + 1) % DIRECTIONS;
            double t0 = 2 * Math.PI * k / DIRECTIONS;
            double t1 = 2 * Math.PI * (k + 1) / DIRECTIONS;
            double det = Math.sin(t1 - t0);
            vx[k] = (h[k] * Math.sin(t1) - h[k1] * Math.sin(t0)) / det;
            vy[k] = (h[k1] * Math.cos(t0) - h[k] * Math.cos(t1)) / det;
        }
        return leastImpedance(fixed, w, vx, vy);
    }

    /**
     * The least |Z| at the load over bank admittances Y in the convex polygon with vertices (vx, vy), in
     * order; 0 when the polygon holds a Y where the load admittance has a pole (no bound there).
     */
    static double leastImpedance(PowerNetwork fixed, double w, double[] vx, double[] vy) {
        double[] y = new double[2];
        fixed.fixedBoardAdmittance(w, y); // regulator, then the fixed board branches (the plane)
        double fr = y[0];
        double fi = y[1];
        fixed.loadAdmittance(w, y);
        double lr = y[0];
        double li = y[1];
        // the load admittance as a Möbius map of the board admittance W = Y_fixed + Y_bank:
        // g(W) = (a·W + b)/(c·W + d); without a package g = W + Y_load (the load sits on the board node)
        double ar;
        double ai;
        double br = lr;
        double bi = li;
        double cr;
        double ci;
        if (fixed.hasPackage()) {
            double pr = fixed.packageResistanceOhms();
            double pi = w * fixed.packageInductanceH();
            ar = 1 + (lr * pr - li * pi);
            ai = lr * pi + li * pr;
            cr = pr;
            ci = pi;
        } else {
            ar = 1;
            ai = 0;
            cr = 0;
            ci = 0;
        }
        int k = vx.length;
        double best = 0; // the largest |g| on the polygon's boundary
        for (int e = 0; e < k; e++) {
            int e1 = (e + 1) % k;
            double wr = fr + vx[e];
            double wi = fi + vy[e];
            double dr = vx[e1] - vx[e];
            double di = vy[e1] - vy[e];
            // g(W0 + t·D) = (α + β t)/(γ + δ t)
            double alr = ar * wr - ai * wi + br;
            double ali = ar * wi + ai * wr + bi;
            double ber = ar * dr - ai * di;
            double bei = ar * di + ai * dr;
            double gar = cr * wr - ci * wi + 1;
            double gai = cr * wi + ci * wr;
            double der = cr * dr - ci * di;
            double dei = cr * di + ci * dr;
            double n0 = alr * alr + ali * ali;
            double n1 = 2 * (alr * ber + ali * bei);
            double n2 = ber * ber + bei * bei;
            double q0 = gar * gar + gai * gai;
            double q1 = 2 * (gar * der + gai * dei);
            double q2 = der * der + dei * dei;
            // the denominator's least value on the edge: a zero there is a pole on the boundary
            double qMin = Math.min(q0, q0 + q1 + q2);
            if (q2 > 0) {
                double tq = -q1 / (2 * q2);
                if (tq > 0 && tq < 1) {
                    qMin = Math.min(qMin, q0 + q1 * tq + q2 * tq * tq);
                }
            }
            if (!(qMin > 1e-300)) {
                return 0;
            }
            best = Math.max(best, ratio(n0, n1, n2, q0, q1, q2, 0));
            // critical points of N/Q: (n2 q1 − n1 q2) t² + 2 (n2 q0 − n0 q2) t + (n1 q0 − n0 q1) = 0
            double a2 = n2 * q1 - n1 * q2;
            double a1 = 2 * (n2 * q0 - n0 * q2);
            double a0 = n1 * q0 - n0 * q1;
            for (double t : roots(a2, a1, a0)) {
                if (t > 0 && t < 1) {
                    best = Math.max(best, ratio(n0, n1, n2, q0, q1, q2, t));
                }
            }
        }
        // a pole strictly inside the polygon (the map is then unbounded on it): W = −d/c
        if (fixed.hasPackage() && (cr != 0 || ci != 0)) {
            double cm = cr * cr + ci * ci;
            double pr = -cr / cm - fr; // −1/c, shifted to bank coordinates
            double pi = ci / cm - fi;
            if (inside(vx, vy, pr, pi)) {
                return 0;
            }
        }
        return best > 0 ? 1 / Math.sqrt(best) : Double.POSITIVE_INFINITY;
    }

    private static double ratio(double n0, double n1, double n2, double q0, double q1, double q2, double t) {
        return (n0 + n1 * t + n2 * t * t) / (q0 + q1 * t + q2 * t * t);
    }

    private static double[] roots(double a, double b, double c) {
        double scale = Math.max(Math.abs(a), Math.max(Math.abs(b), Math.abs(c)));
        if (scale == 0) {
            return new double[0];
        }
        a /= scale;
        b /= scale;
        c /= scale;
        if (Math.abs(a) < 1e-14) {
            return Math.abs(b) < 1e-300 ? new double[0] : new double[] {-c / b};
        }
        double disc = b * b - 4 * a * c;
        if (disc < 0) {
            return new double[0];
        }
        double sq = Math.sqrt(disc);
        double q = -0.5 * (b + Math.copySign(sq, b));
        return q == 0 ? new double[] {0} : new double[] {q / a, c / q};
    }

    /** Whether (px, py) lies strictly inside the convex polygon (vertices in counter-clockwise order). */
    static boolean inside(double[] vx, double[] vy, double px, double py) {
        int k = vx.length;
        for (int e = 0; e < k; e++) {
            int e1 = (e + 1) % k;
            double cross = (vx[e1] - vx[e]) * (py - vy[e]) - (vy[e1] - vy[e]) * (px - vx[e]);
            if (cross <= 0) {
                return false;
            }
        }
        return true;
    }
}
