package breakwater.timedomain;

/**
 * Splits the smooth impulse response h(t) = Σ w_i Re(r_i e^{p_i t}) into its sign intervals and
 * integrates h exactly over each one with the antiderivative H(t) = Σ w_i Re((r_i/p_i) e^{p_i t})
 * (docs/worst-case.md#ideal-edges): no quadrature sum, no dependence on a fixed step.
 *
 * <p>Crossings are found by sampling h and h' on a grid whose step is 1/8 of the period 2π/|p| of the
 * fastest mode still alive (values advanced by the recurrence e^{p(t+Δ)} = e^{pt}·e^{pΔ}, no exp call
 * per sample); where h provably keeps its sign over 2^l steps (l ≤ 7: |h| above a bound on |h'| times
 * the span, or above twice the amplitudes of the fastest j ≤ 3 modes plus the span times a bound on the
 * slope of the others), those steps are taken at once. A sign change brackets one crossing; a pair of crossings inside one step (a shallow dip
 * through zero) is caught from the slopes at both ends: the cubic Hermite interpolant locates the
 * extremum, which is evaluated exactly. Each crossing is refined from the cubic Hermite guess with one or
 * two exact evaluations of h, h', h'' and H and a second-order Taylor step, taken once the correction ε is
 * at most 1e-3 of the step Δ: H is then known at the crossing to its Taylor remainder h'''·ε⁴/24 &le;
 * Σ|w r| |p|³ (1e-3·π/(4|p|))⁴/24 &lt; 2e-14 · Σ|w r|/|p|, i.e. below 2e-14·S per crossing, and the
 * crossing time itself to order ε³, which moves the integrals only at second order (h = 0 there).
 *
 * <p>Modes die one by one: a mode is dropped once its tail bound |w r| e^{Re(p) t}/|Re p| falls below
 * 1e-13 of S = Σ |w r|/|Re p| (S bounds ∫|h|); the march stops when the total tail bound is below
 * {@code relTol} times the integral of |h| accumulated so far (both checked every 16 steps). The last interval takes the exact
 * remainder −H(t) to infinity. Accuracy of each interval integral: about 1e-13·S plus the tail bound.
 */
final class ImpulseMarch {

    /** Receives the sign intervals of h in order; the last one ends at the stop time (tail included). */
    interface Sink {
        void interval(double startS, double endS, double integral, boolean positive);
    }

    /**
     * A mode is dropped once its tail bound |w r| e^{Re(p) t}/|Re p| falls below this fraction of
     * S = Σ|w r|/|Re p|: the level of the march's own rounding per interval (about 1e-13·S), so what is
     * dropped is lost in that rounding, and each dead mode stops costing time.
     */
    private static final double DROP = 1e-13;
    /**
     * Steps between checks of the tail bound (dropping dead modes, stopping): a check loops over the modes
     * as a step does, and the march stops at most this many steps later than it could.
     */
    private static final int CHECK_EVERY = 16;
    /** Long steps of 2, 4, …, 128 base steps where h provably keeps its sign. */
    private static final int LEVELS = 8;
    /**
     * Splits tried in the long-step sign test: the fastest 0, 1, 2 or 3 modes bounded by their amplitude,
     * the rest by their slope. A fast mode ringing down slowly otherwise holds the march to its own step
     * long after it has become too small to change the sign of h.
     */
    private static final int SPLITS = 4;

    /**
     * The base step is π/(4|p|) of the fastest live mode, 1/8 of its period: the step that the crossing
     * refinement's error bound (class comment) and the dip test are stated for. A longer step weakens the
     * Hermite bound of the dip test with Δ⁴; a shorter one only costs time.
     */
    private static final int STEPS_PER_HALF_PERIOD = 4;

    /**
     * Safety factor on the cubic Hermite remainder max|h⁗|·Δ⁴/384 in the dip test: a dip whose cubic
     * comes within twice that bound of zero is evaluated exactly, so a shallow double crossing inside one
     * step is not missed through the bound being tight.
     */
    private static final int DIP_MARGIN = 2;

    /**
     * Iteration cap of the crossing refinement: each iteration at least halves the bracket (bisection is
     * the fallback), and 40 halvings take it from one step to below 1e-12 of a step; usually one or two
     * Taylor steps end it.
     */
    private static final int REFINE_MAX_ITERATIONS = 40;

    /**
     * The second-order Taylor step ends the refinement once the correction ε is at most this fraction of
     * the step: H is then known at the crossing to its ε⁴ remainder, below 2e-14·S (class comment).
     */
    private static final double TAYLOR_STEP_FRACTION = 1e-3;

    /**
     * The refinement also ends when the bracket is below this fraction of the time (or of the step):
     * a few ulps, where the crossing time cannot be resolved further.
     */
    private static final double BRACKET_TOLERANCE = 1e-15;

    /** Iteration cap of the root search on the cubic Hermite interpolant (safeguarded Newton). */
    private static final int HERMITE_ROOT_MAX_ITERATIONS = 30;

    /**
     * The root of the cubic, in units of the step, is good enough to this: it is only the first guess of
     * the exact refinement, which needs it within {@link #TAYLOR_STEP_FRACTION} of the step.
     */
    private static final double HERMITE_ROOT_TOLERANCE = 1e-9;

    /**
     * Below this |p·δ| the exact evaluation takes e^{pδ} from its Taylor polynomial of degree
     * {@value #SERIES_DEGREE} instead of exp, cos and sin: the remainder is below |z|⁹/9! &lt; 1.5e-21, far
     * under the rounding of the sum (about 1e-16), and the polynomial costs a fraction of the three calls.
     * Only the fastest live modes (|p| above a fortieth of the fastest) need the calls.
     */
    private static final double SERIES_RADIUS = 0.02;
    private static final int SERIES_DEGREE = 8;
    private static final double[] INVERSE = {0, 1, 1 / 2.0, 1 / 3.0, 1 / 4.0, 1 / 5.0, 1 / 6.0, 1 / 7.0, 1 / 8.0};

    /** Bisections for the cubic's extremum: 2⁻⁶⁰ of a step, beyond double precision. */
    private static final int EXTREMUM_BISECTIONS = 60;

    private final PoleResidueModel model;
    private final int n;
    // active modes, compacted in order of |p| descending (index 0 is the fastest alive)
    private final double[] pr;
    private final double[] pi;
    private final double[] ipr;
    private final double[] ipi;
    private final double[] p2r;
    private final double[] p2i;
    private final double[] c4;
    private final double[] c1;
    /**
     * Sign tests for long steps, from the last check: h keeps its sign over a span s when
     * |h| &gt; splitAmp[j] + splitSlope[j]·s for some j (see {@link #run}), splitSlope being the bound on
     * the slope of all but the j fastest modes.
     */
    private final double[] splitAmp = new double[SPLITS];
    /** 1/(splitSlope[j]·dt): the span in steps over which the slope of the rest can move h by 1. */
    private final double[] splitStepsPerSlope = new double[SPLITS];
    private final double[] b0;
    private final double[] zr;
    private final double[] zi;
    private final double[][] er;
    private final double[][] ei;
    private final double[] bound;
    /** 1/(−Re p). */
    private final double[] decay;
    private int na;

    // exact evaluation results
    private double xh;
    private double xhp;
    private double xhpp;
    private double xH;
    // refined crossing
    private double rootT;
    private double rootH;

    ImpulseMarch(PoleResidueModel m) {
        model = m;
        n = m.modes;
        pr = new double[n];
        pi = new double[n];
        ipr = new double[n];
        ipi = new double[n];
        p2r = new double[n];
        p2i = new double[n];
        c4 = new double[n];
        c1 = new double[n];
        b0 = new double[n];
        zr = new double[n];
        zi = new double[n];
        er = new double[LEVELS][n];
        ei = new double[LEVELS][n];
        bound = new double[n];
        decay = new double[n];
    }

    private void reset() {
        PoleResidueModel m = model;
        na = n;
        for (int k = 0; k < n; k++) {
            double a = m.pr[k];
            double b = m.pi[k];
            pr[k] = a;
            pi[k] = b;
            double p2 = a * a + b * b;
            ipr[k] = a / p2;
            ipi[k] = -b / p2;
            p2r[k] = a * a - b * b;
            p2i[k] = 2 * a * b;
            c4[k] = -a * p2 * p2;
            c1[k] = -a * Math.sqrt(p2);
            zr[k] = m.weight[k] * m.rr[k];
            zi[k] = m.weight[k] * m.ri[k];
            decay[k] = 1 / -a;
            b0[k] = Math.sqrt(zr[k] * zr[k] + zi[k] * zi[k]) * decay[k];
            bound[k] = b0[k];
        }
    }

    /** Removes active mode j, keeping the order. */
    private void removeActive(int j) {
        int len = na - j - 1;
        for (double[] arr : new double[][]{pr, pi, ipr, ipi, p2r, p2i, c4, c1, b0, zr, zi, bound, decay}) {
            System.arraycopy(arr, j + 1, arr, j, len);
        }
        for (int l = 0; l < LEVELS; l++) {
            System.arraycopy(er[l], j + 1, er[l], j, len);
            System.arraycopy(ei[l], j + 1, ei[l], j, len);
        }
        na--;
    }

    /**
     * Runs the march over the model's h and reports every sign interval to {@code sink}.
     *
     * @return the stop time, s (0 when the model has no modes)
     */
    double run(double relTol, Sink sink) {
        reset();
        if (n == 0) {
            return 0.0;
        }
        double total = 0;
        for (int k = 0; k < n; k++) {
            total += b0[k];
        }
        final double dropLevel = DROP * total;
        double t = 0;
        double h = 0;
        double hp = 0;
        double bigH = 0;
        for (int k = 0; k < na; k++) {
            h += zr[k];
            hp += pr[k] * zr[k] - pi[k] * zi[k];
            bigH += zr[k] * ipr[k] - zi[k] * ipi[k];
        }
        boolean positive = h > 0 || (h == 0 && hp > 0);
        double segStart = 0;
        double segH = bigH;
        double accumulated = 0;
        double fastest = -1;
        double dt = 0;
        int sinceCheck = CHECK_EVERY;
        while (true) {
            if (sinceCheck >= CHECK_EVERY) {
                sinceCheck = 0;
                // tail bounds |w r| e^{Re(p) t}/|Re p|; drop dead modes; stop when the tail is negligible
                double tail = 0;
                bigH = 0;
                for (int k = na - 1; k >= 0; k--) {
                    // |w r e^{pt}|/|Re p| from the mode's current value (equals b0·e^{Re p·t})
                    double bk = Math.sqrt(zr[k] * zr[k] + zi[k] * zi[k]) * decay[k];
                    if (bk <= dropLevel) {
                        removeActive(k);
                        continue;
                    }
                    bound[k] = bk;
                    tail += bk;
                    bigH += zr[k] * ipr[k] - zi[k] * ipi[k];
                }
                // the split sign tests: twice the amplitudes of the j fastest modes, the slopes of the rest
                double amp = 0;
                for (int j = 0; j < SPLITS; j++) {
                    double slope = 0;
                    for (int k = j; k < na; k++) {
                        slope += bound[k] * c1[k];
                    }
                    splitAmp[j] = 2 * amp;
                    splitStepsPerSlope[j] = slope; // divided into 1/(slope·dt) once dt is known, below
                    if (j < na) {
                        amp += bound[j] * -pr[j];
                    }
                }
                if (na == 0 || tail <= relTol * (accumulated + Math.abs(bigH - segH))) {
                    break;
                }
                double speed = Math.sqrt(pr[0] * pr[0] + pi[0] * pi[0]);
                if (speed != fastest) {
                    fastest = speed;
                    dt = Math.PI / (STEPS_PER_HALF_PERIOD * speed);
                    for (int k = 0; k < na; k++) {
                        double e = Math.exp(pr[k] * dt);
                        double a = e * Math.cos(pi[k] * dt);
                        double b = e * Math.sin(pi[k] * dt);
                        for (int l = 0; l < LEVELS; l++) {
                            er[l][k] = a;
                            ei[l][k] = b;
                            double a2 = a * a - b * b;
                            b = 2 * a * b;
                            a = a2;
                        }
                    }
                }
                for (int j = 0; j < SPLITS; j++) {
                    splitStepsPerSlope[j] = 1 / (splitStepsPerSlope[j] * dt);
                }
            }
            sinceCheck++;
            // h keeps its sign over the next 2^l steps if, for a split j of the modes into the j fastest
            // (F) and the rest (R), |h| > 2·Σ_F |w r e^{pt}| + span·Σ_R |w r e^{pt}||p|: |F| stays below its
            // sum and R moves by at most span·max|R'| (each |w r e^{pt}| only decays), so
            // |h(t + u)| ≥ |h(t)| − 2|F|max − u·max|R'| > 0; j = 0 is the plain slope bound. Those steps are
            // taken at once; the longest such span, in steps, is max_j (|h| − amp_j)/(slope_j·dt)
            int level = 0;
            double absH = Math.abs(h);
            double steps = 0;
            for (int j = 0; j < SPLITS; j++) {
                if (absH > splitAmp[j]) {
                    steps = Math.max(steps, (absH - splitAmp[j]) * splitStepsPerSlope[j]);
                }
            }
            while (level < LEVELS - 1 && (2 << level) < steps) {
                level++;
            }
            double[] erl = er[level];
            double[] eil = ei[level];
            double ha = h;
            double hpa = hp;
            h = 0;
            hp = 0;
            for (int k = 0; k < na; k++) {
                double a = zr[k];
                double b = zi[k];
                double c = a * erl[k] - b * eil[k];
                double d = a * eil[k] + b * erl[k];
                zr[k] = c;
                zi[k] = d;
                h += c;
                hp += pr[k] * c - pi[k] * d;
            }
            double ta = t;
            t += dt * (1 << level);
            if (level > 0) {
                continue;
            }
            boolean crossesAtEnd = positive ? h <= 0 : h >= 0;
            if (crossesAtEnd) {
                refine(ta, ha, hpa, t, h, hp, t);
                double integral = rootH - segH;
                sink.interval(segStart, rootT, integral, positive);
                accumulated += Math.abs(integral);
                positive = !positive;
                segStart = rootT;
                segH = rootH;
            } else if (positive ? (hpa < 0 && hp > 0) : (hpa > 0 && hp < 0)) {
                // a dip towards zero inside the step: locate the extremum of the cubic Hermite interpolant
                double theta = hermiteExtremum(ha, hpa * dt, h, hp * dt);
                // |h − cubic| ≤ max|h|·Δ⁴/384 (Hermite remainder), max|h| ≤ Σ |w r| |p|⁴ e^{Re p t}
                double m4 = 0;
                for (int k = 0; k < na; k++) {
                    m4 += bound[k] * c4[k];
                }
                double margin = DIP_MARGIN * m4 * dt * dt * dt * dt / 384;
                double cubic = hermiteValue(ha, hpa * dt, h, hp * dt, theta);
                if (theta > 0 && theta < 1 && (positive ? cubic < margin : cubic > -margin)) {
                    double tm = ta + theta * dt;
                    evalAt(tm - t);
                    boolean flipped = positive ? xh <= 0 : xh >= 0;
                    if (flipped) {
                        double hm = xh;
                        double hpm = xhp;
                        refine(ta, ha, hpa, tm, hm, hpm, t);
                        double integral = rootH - segH;
                        sink.interval(segStart, rootT, integral, positive);
                        accumulated += Math.abs(integral);
                        segStart = rootT;
                        segH = rootH;
                        refine(tm, hm, hpm, t, h, hp, t);
                        integral = rootH - segH;
                        sink.interval(segStart, rootT, integral, !positive);
                        accumulated += Math.abs(integral);
                        segStart = rootT;
                        segH = rootH;
                    }
                }
            }
        }
        // the last interval runs to infinity: exact remainder H(∞) − H(segStart) = −H(segStart)
        sink.interval(segStart, Math.max(t, segStart), -segH, positive);
        return Math.max(t, segStart);
    }

    /**
     * Exact h, h', h'', H at time tb + delta, where tb is the current grid time (delta &le; 0 typically),
     * over the active modes.
     */
    private void evalAt(double delta) {
        double h = 0;
        double hp = 0;
        double hpp = 0;
        double bigH = 0;
        for (int k = 0; k < na; k++) {
            double x = pr[k] * delta;
            double y = pi[k] * delta;
            double cr;
            double ci;
            if (x * x + y * y <= SERIES_RADIUS * SERIES_RADIUS) {
                // e^z = 1 + z(1 + z/2(1 + z/3(… (1 + z/8)))), Horner
                cr = 1;
                ci = 0;
                for (int j = SERIES_DEGREE; j >= 1; j--) {
                    double inv = INVERSE[j];
                    double nr = 1 + (cr * x - ci * y) * inv;
                    ci = (cr * y + ci * x) * inv;
                    cr = nr;
                }
            } else if (y == 0.0) {
                cr = Math.exp(x);
                ci = 0;
            } else {
                double e = Math.exp(x);
                cr = e * Math.cos(y);
                ci = e * Math.sin(y);
            }
            double a = zr[k] * cr - zi[k] * ci;
            double b = zr[k] * ci + zi[k] * cr;
            h += a;
            hp += pr[k] * a - pi[k] * b;
            hpp += p2r[k] * a - p2i[k] * b;
            bigH += a * ipr[k] - b * ipi[k];
        }
        xh = h;
        xhp = hp;
        xhpp = hpp;
        xH = bigH;
    }

    /**
     * Refines the crossing of h in [lo, hi] (h(lo), h(hi) of opposite sign or h(hi) = 0); tb is the
     * current grid time the mode values belong to. Leaves the crossing time and H there in rootT/rootH.
     */
    private void refine(double lo, double hlo, double hplo, double hi, double hhi, double hphi, double tb) {
        double span = hi - lo;
        double guess = lo + span * hermiteRoot(hlo, hplo * span, hhi, hphi * span);
        double a = lo;
        double b = hi;
        boolean loPositive = hlo > 0;
        for (int it = 0; it < REFINE_MAX_ITERATIONS; it++) {
            evalAt(guess - tb);
            double h = xh;
            double hp = xhp;
            double hpp = xhpp;
            if (h == 0.0) {
                rootT = guess;
                rootH = xH;
                return;
            }
            if ((h > 0) == loPositive) {
                a = guess;
            } else {
                b = guess;
            }
            // second-order correction: h + h'ε + h''ε²/2 = 0, the root nearest 0
            double eps = hp != 0 ? -h / hp : 0;
            for (int k = 0; k < 2 && hp != 0; k++) {
                double den = hp + 0.5 * hpp * eps;
                if (den != 0) {
                    eps = -h / den;
                }
            }
            if (hp != 0 && Math.abs(eps) <= TAYLOR_STEP_FRACTION * span && guess + eps >= lo && guess + eps <= hi) {
                rootT = guess + eps;
                rootH = xH + eps * (h + eps * (0.5 * hp + eps * hpp / 6.0));
                return;
            }
            double next = guess + eps;
            if (!(next > a && next < b)) {
                next = 0.5 * (a + b);
            }
            if (b - a <= BRACKET_TOLERANCE * Math.max(Math.abs(a), span)) {
                rootT = next;
                evalAt(next - tb);
                rootH = xH;
                return;
            }
            guess = next;
        }
        rootT = guess;
        evalAt(guess - tb);
        rootH = xH;
    }

    /**
     * Root in [0, 1] of the cubic Hermite interpolant with values f0, f1 and scaled slopes d0, d1
     * (slopes times the interval length), f0 and f1 of opposite sign; safeguarded Newton.
     */
    static double hermiteRoot(double f0, double d0, double f1, double d1) {
        double lo = 0;
        double hi = 1;
        double x = f0 / (f0 - f1);
        if (!(x > 0 && x < 1)) {
            x = 0.5;
        }
        boolean loPos = f0 > 0;
        for (int it = 0; it < HERMITE_ROOT_MAX_ITERATIONS; it++) {
            double x2 = x * x;
            double x3 = x2 * x;
            double h00 = 2 * x3 - 3 * x2 + 1;
            double h10 = x3 - 2 * x2 + x;
            double h01 = -2 * x3 + 3 * x2;
            double h11 = x3 - x2;
            double f = h00 * f0 + h10 * d0 + h01 * f1 + h11 * d1;
            double fp = (6 * x2 - 6 * x) * f0 + (3 * x2 - 4 * x + 1) * d0 + (-6 * x2 + 6 * x) * f1
                    + (3 * x2 - 2 * x) * d1;
            if ((f > 0) == loPos) {
                lo = x;
            } else {
                hi = x;
            }
            double next = fp != 0 ? x - f / fp : 0.5 * (lo + hi);
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - x) < HERMITE_ROOT_TOLERANCE) {
                return next;
            }
            x = next;
        }
        return x;
    }

    /** Value at x ∈ [0, 1] of the cubic Hermite interpolant (values f0, f1, scaled slopes d0, d1). */
    static double hermiteValue(double f0, double d0, double f1, double d1, double x) {
        double x2 = x * x;
        double x3 = x2 * x;
        return (2 * x3 - 3 * x2 + 1) * f0 + (x3 - 2 * x2 + x) * d0 + (-2 * x3 + 3 * x2) * f1 + (x3 - x2) * d1;
    }

    /**
     * Stationary point in (0, 1) of the cubic Hermite interpolant (values f0, f1, scaled slopes d0, d1)
     * where the slope changes from the sign of d0 to the sign of d1; NaN if none.
     */
    static double hermiteExtremum(double f0, double d0, double f1, double d1) {
        // p'(x) = A x² + B x + C
        double a = 6 * f0 + 3 * d0 - 6 * f1 + 3 * d1;
        double b = -6 * f0 - 4 * d0 + 6 * f1 - 2 * d1;
        double c = d0;
        // p'(0) = d0, p'(1) = d1 have opposite signs: bisect p' on [0, 1] (robust for any a)
        double lo = 0;
        double hi = 1;
        boolean loPos = c > 0;
        for (int it = 0; it < EXTREMUM_BISECTIONS; it++) {
            double x = 0.5 * (lo + hi);
            double v = (a * x + b) * x + c;
            if ((v > 0) == loPos) {
                lo = x;
            } else {
                hi = x;
            }
        }
        return 0.5 * (lo + hi);
    }
}
