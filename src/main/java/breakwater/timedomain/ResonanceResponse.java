package breakwater.timedomain;

import java.util.Locale;

/**
 * How hard a load can ring one anti-resonance at f0, all per ampere of load step ΔI (multiply by ΔI for
 * volts), from the pole–residue form exactly:
 * <ul>
 * <li>{@code q}: Q = |p|/(2|Re p|) of the dominant pole pair at f0 (see {@code dominant}: the pair with the largest
 *     |r|/|j2πf0 − p| among pairs ringing within a factor 2 of f0). For one parallel resonance L ∥ (R + 1/(sC)) this is
 *     √(L/C)/R.</li>
 * <li>{@code stepPeakOhms}: the largest value of the step response S(t) = D₀ + ∫₀^t h over t &gt; 0
 *     (its maxima lie at the + to − crossings of h, found exactly by {@link ImpulseMarch}).</li>
 * <li>{@code sineAmplitudeOhms}: half the peak-to-peak of the periodic steady state under a load swinging
 *     sinusoidally 0..1 A at f0: |Z(j2πf0)|/2.</li>
 * <li>{@code squareAmplitudeOhms}: the same for a 50 % square wave 0..1 A at f0: the periodic solution of
 *     every mode x' = p·x + u over one period in closed form (x(0) = −E/(p(1 + E)), E = e^{pT/2}),
 *     half of max − min of D₀·u + Σ w Re(r x) over the period, the extremes refined by golden-section
 *     search on the exact expression (relative accuracy ~1e-12).</li>
 * <li>{@code cyclesTo95Percent}: the first cycle m of a drive u(t) = (1 − cos 2πf0·t)/2 from rest whose
 *     half peak-to-peak (over [(m−1)/f0, m/f0], 256 samples refined as above) reaches 95 % of the
 *     steady-state {@code sineAmplitudeOhms}.</li>
 * </ul>
 * Ideal edges: a series inductance L∞ at the load node adds impulses at the square wave's edges and at
 * the step; they are not part of these figures (the sinusoidal ones include it through Z).
 */
public record ResonanceResponse(double frequencyHz, double q, double stepPeakOhms, double sineAmplitudeOhms,
                                double squareAmplitudeOhms, int cyclesTo95Percent) {

    /**
     * A pole pair rings "at" f0 when its ringing frequency Im p lies within this factor of 2πf0 either
     * way: wide enough to admit the pair behind the peak where overlapping modes pull the peak of |Z| off
     * the pole's own frequency; among the pairs admitted, the one contributing most to Z(j2πf0) is taken,
     * so a neighbour inside the band does not take its place.
     */
    private static final int NEAR_FACTOR = 2;

    /**
     * Extremes of the mode's own step response examined: they alternate about the final value and shrink
     * as e^{σt}, so the largest lies among the first on either side; the rest of the six are room for
     * those that fall at t &le; 0 and are skipped.
     */
    private static final int OWN_STEP_EXTREMES = 6;

    /** Tail tolerance of the step-response march, as for the ideal-edge worst case (1e-10 relative). */
    private static final double STEP_PEAK_TAIL_TOLERANCE = 1e-10;

    /**
     * Samples per search interval (a half period of the square wave, a period of the drive) before the
     * golden-section refinement around the best one, which assumes that the extreme lies within one sample
     * of it: dense against the wave's shape at f0 (the tests compare square/sine with 4/π to 0.5 %).
     */
    private static final int EXTREME_SAMPLES = 256;

    /**
     * The figure cyclesTo95Percent counts cycles up to this fraction of the steady state (its definition;
     * 95 % is common practice for "settled").
     */
    private static final double SETTLED_FRACTION = 0.95;

    /**
     * Cycles of resonant drive tried before giving up: about Q + 0.5 cycles are needed
     * ({@code ResonanceResponseTest}), so only a resonance of Q near 1e5, far beyond any bank, reaches the
     * cap, and it is reported as a {@link ModelException}, not as a figure.
     */
    private static final int MAX_CYCLES = 100000;

    /** Iteration cap of the golden-section search: 0.618⁶⁰ ≈ 3e-13 of the starting bracket. */
    private static final int GOLDEN_MAX_ITERATIONS = 60;

    /** The golden-section search stops when the bracket is below this fraction of |t|: a few dozen ulps. */
    private static final double GOLDEN_TOLERANCE = 1e-14;

    public ResonanceResponse {
        if (!(frequencyHz > 0) || !Double.isFinite(frequencyHz)) {
            throw new IllegalArgumentException("resonance frequency must be > 0, got " + frequencyHz);
        }
    }

    /**
     * Peak of the step response of the mode that rings at {@code frequencyHz} on its own (the dominant
     * pole pair, chosen as for {@link #q()}), per ampere: the part of the network's step response that this
     * anti-resonance contributes. For a pair p = σ + jω with residue r, stored once, its step response is
     * s(t) = 2·Re(r/p·(e^{pt} − 1)); its extremes lie where Re(r·e^{pt}) = 0, i.e. at ωt + arg r = π/2 + kπ.
     * The largest |s| over the first extremes (they shrink as e^{σt}) and the final value is returned.
     *
     * @throws IllegalArgumentException when no oscillating mode lies near {@code frequencyHz}
     */
    public static double ownStepPeakOhms(PoleResidueModel model, double frequencyHz) {
        int dom = dominant(model, 2 * Math.PI * frequencyHz);
        if (dom < 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "no oscillating mode near %.6g Hz: the network has no anti-resonance there", frequencyHz));
        }
        double sr = model.pr[dom];
        double si = model.pi[dom];
        double rr = model.rr[dom];
        double ri = model.ri[dom];
        double w = model.weight[dom];
        // r/p
        double m2 = sr * sr + si * si;
        double qr = (rr * sr + ri * si) / m2;
        double qi = (ri * sr - rr * si) / m2;
        double phase = Math.atan2(ri, rr);
        double best = Math.abs(w * qr); // final value −w·Re(r/p)·(−1) magnitude
        double k0 = Math.ceil((phase - Math.PI / 2) / Math.PI);
        for (int k = 0; k < OWN_STEP_EXTREMES; k++) {
            double t = (Math.PI / 2 + (k0 + k) * Math.PI - phase) / si;
            if (t <= 0) {
                continue;
            }
            double e = Math.exp(sr * t);
            double c = e * Math.cos(si * t) - 1;
            double d = e * Math.sin(si * t);
            double val = w * (qr * c - qi * d);
            best = Math.max(best, Math.abs(val));
        }
        return best;
    }

    /**
     * The oscillating mode that rings at ω0: the stored pair with the largest contribution
     * |r|/|jω0 − p| to Z(jω0) among the pairs whose ringing frequency Im p lies within a factor 2 of ω0
     * (among all oscillating pairs when none does), or −1 when the network has no oscillating mode.
     */
    private static int dominant(PoleResidueModel model, double w0) {
        int dom = pick(model, w0, true);
        return dom >= 0 ? dom : pick(model, w0, false);
    }

    private static int pick(PoleResidueModel model, double w0, boolean nearOnly) {
        int dom = -1;
        double best = 0;
        for (int k = 0; k < model.modes; k++) {
            if (model.pi[k] == 0.0) {
                continue;
            }
            if (nearOnly && (model.pi[k] < w0 / NEAR_FACTOR || model.pi[k] > NEAR_FACTOR * w0)) {
                continue;
            }
            double v = Math.hypot(model.rr[k], model.ri[k]) / Math.hypot(model.pr[k], w0 - model.pi[k]);
            if (v > best) {
                best = v;
                dom = k;
            }
        }
        return dom;
    }

    /** Analyses the anti-resonance at {@code frequencyHz} of {@code model}. */
    public static ResonanceResponse of(PoleResidueModel model, double frequencyHz) {
        if (!(frequencyHz > 0) || !Double.isFinite(frequencyHz)) {
            throw new IllegalArgumentException("resonance frequency must be > 0, got " + frequencyHz);
        }
        double w0 = 2 * Math.PI * frequencyHz;
        int dom = dominant(model, w0);
        if (dom < 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "no oscillating mode near %.6g Hz: the network has no anti-resonance there", frequencyHz));
        }
        double q = Math.hypot(model.pr[dom], model.pi[dom]) / (-2 * model.pr[dom]);
        double[] z = new double[2];
        model.impedance(frequencyHz, z);
        double sine = 0.5 * Math.hypot(z[0], z[1]);
        return new ResonanceResponse(frequencyHz, q, stepPeak(model), sine, squareAmplitude(model, w0),
                cyclesTo95(model, w0, sine));
    }

    static double stepPeak(PoleResidueModel model) {
        final double[] acc = {model.constantTermOhms(), model.constantTermOhms()};
        new ImpulseMarch(model).run(STEP_PEAK_TAIL_TOLERANCE, (start, end, integral, positive) -> {
            acc[0] += integral;
            acc[1] = Math.max(acc[1], acc[0]);
        });
        return acc[1];
    }

    /** Evaluates D₀·u + Σ w Re(r x_k(t)) for a periodic square wave at the given phase. */
    private static final class Square {
        final PoleResidueModel m;
        final double half;
        final double[] x0r;
        final double[] x0i;
        final double[] xhr;
        final double[] xhi;

        Square(PoleResidueModel m, double w0) {
            this.m = m;
            half = Math.PI / w0;
            int n = m.modes;
            x0r = new double[n];
            x0i = new double[n];
            xhr = new double[n];
            xhi = new double[n];
            for (int k = 0; k < n; k++) {
                double pr = m.pr[k];
                double pi = m.pi[k];
                double e = Math.exp(pr * half);
                double er = e * Math.cos(pi * half);
                double ei = e * Math.sin(pi * half);
                // x0 = −E/(p(1+E))
                double dr = pr * (1 + er) - pi * ei;
                double di = pr * ei + pi * (1 + er);
                double dm = dr * dr + di * di;
                x0r[k] = -(er * dr + ei * di) / dm;
                x0i[k] = -(ei * dr - er * di) / dm;
                // x(T/2) = E x0 + (E − 1)/p
                double p2 = pr * pr + pi * pi;
                double qr = ((er - 1) * pr + ei * pi) / p2;
                double qi = (ei * pr - (er - 1) * pi) / p2;
                xhr[k] = er * x0r[k] - ei * x0i[k] + qr;
                xhi[k] = er * x0i[k] + ei * x0r[k] + qi;
            }
        }

        /** y at time s into the first half (on = true, u = 1) or the second half (u = 0). */
        double y(double s, boolean on) {
            double v = on ? m.constantTermOhms() : 0;
            for (int k = 0; k < m.modes; k++) {
                double pr = m.pr[k];
                double pi = m.pi[k];
                double e = Math.exp(pr * s);
                double er = e * Math.cos(pi * s);
                double ei = e * Math.sin(pi * s);
                double xr;
                double xi;
                if (on) {
                    double p2 = pr * pr + pi * pi;
                    double qr = ((er - 1) * pr + ei * pi) / p2;
                    double qi = (ei * pr - (er - 1) * pi) / p2;
                    xr = er * x0r[k] - ei * x0i[k] + qr;
                    xi = er * x0i[k] + ei * x0r[k] + qi;
                } else {
                    xr = er * xhr[k] - ei * xhi[k];
                    xi = er * xhi[k] + ei * xhr[k];
                }
                v += m.weight[k] * (m.rr[k] * xr - m.ri[k] * xi);
            }
            return v;
        }
    }

    static double squareAmplitude(PoleResidueModel model, double w0) {
        Square sq = new Square(model, w0);
        double max = Double.NEGATIVE_INFINITY;
        double min = Double.POSITIVE_INFINITY;
        for (boolean on : new boolean[]{true, false}) {
            java.util.function.DoubleUnaryOperator f = s -> sq.y(s, on);
            Extremes ext = extremes(f, 0, sq.half, EXTREME_SAMPLES);
            max = Math.max(max, ext.max());
            min = Math.min(min, ext.min());
        }
        return 0.5 * (max - min);
    }

    static int cyclesTo95(PoleResidueModel model, double w0, double steady) {
        double period = 2 * Math.PI / w0;
        for (int cycle = 1; cycle <= MAX_CYCLES; cycle++) {
            double t0 = (cycle - 1) * period;
            Extremes ext = extremes(t -> drivenFromRest(model, w0, t), t0, t0 + period, EXTREME_SAMPLES);
            if (0.5 * (ext.max() - ext.min()) >= SETTLED_FRACTION * steady) {
                return cycle;
            }
        }
        throw new ModelException("resonant drive did not reach 95 % of its steady state in " + MAX_CYCLES + " cycles");
    }

    /**
     * Response to u(t) = (1 − cos ω t)/2 from rest: x_k = ½(e^{pt} − 1)/p − ¼[(e^{jωt} − e^{pt})/(jω − p)
     * + (e^{−jωt} − e^{pt})/(−jω − p)], plus D₀·u and L∞·u'.
     */
    static double drivenFromRest(PoleResidueModel m, double w, double t) {
        double c = Math.cos(w * t);
        double s = Math.sin(w * t);
        double v = m.constantTermOhms() * 0.5 * (1 - c) + m.seriesInductanceH() * 0.5 * w * s;
        for (int k = 0; k < m.modes; k++) {
            double pr = m.pr[k];
            double pi = m.pi[k];
            double e = Math.exp(pr * t);
            double er = e * Math.cos(pi * t);
            double ei = e * Math.sin(pi * t);
            double p2 = pr * pr + pi * pi;
            // ½(E − 1)/p
            double ar = 0.5 * ((er - 1) * pr + ei * pi) / p2;
            double ai = 0.5 * (ei * pr - (er - 1) * pi) / p2;
            // (e^{jwt} − E)/(jw − p)
            double nr = c - er;
            double ni = s - ei;
            double dr = -pr;
            double di = w - pi;
            double dm = dr * dr + di * di;
            double br = (nr * dr + ni * di) / dm;
            double bi = (ni * dr - nr * di) / dm;
            // (e^{−jwt} − E)/(−jw − p)
            nr = c - er;
            ni = -s - ei;
            dr = -pr;
            di = -w - pi;
            dm = dr * dr + di * di;
            double gr = (nr * dr + ni * di) / dm;
            double gi = (ni * dr - nr * di) / dm;
            double xr = ar - 0.25 * (br + gr);
            double xi = ai - 0.25 * (bi + gi);
            v += m.weight[k] * (m.rr[k] * xr - m.ri[k] * xi);
        }
        return v;
    }

    /**
     * The smallest and largest value of a function on an interval.
     *
     * @param min the smallest value found
     * @param max the largest value found
     */
    record Extremes(double min, double max) {
    }

    /** Extremes of f on [a, b]: n + 1 samples, then golden-section refinement around the best ones. */
    static Extremes extremes(java.util.function.DoubleUnaryOperator f, double a, double b, int n) {
        double h = (b - a) / n;
        int iMin = 0;
        int iMax = 0;
        double vMin = Double.POSITIVE_INFINITY;
        double vMax = Double.NEGATIVE_INFINITY;
        for (int i = 0; i <= n; i++) {
            double v = f.applyAsDouble(a + i * h);
            if (v < vMin) {
                vMin = v;
                iMin = i;
            }
            if (v > vMax) {
                vMax = v;
                iMax = i;
            }
        }
        double lo = golden(f, a + Math.max(iMin - 1, 0) * h, a + Math.min(iMin + 1, n) * h, -1);
        double hi = golden(f, a + Math.max(iMax - 1, 0) * h, a + Math.min(iMax + 1, n) * h, 1);
        return new Extremes(Math.min(vMin, lo), Math.max(vMax, hi));
    }

    /** Golden-section search for the maximum of sign·f on [a, b]; returns f there. */
    private static double golden(java.util.function.DoubleUnaryOperator f, double a, double b, double sign) {
        final double g = (Math.sqrt(5) - 1) / 2;
        double x1 = b - g * (b - a);
        double x2 = a + g * (b - a);
        double f1 = sign * f.applyAsDouble(x1);
        double f2 = sign * f.applyAsDouble(x2);
        for (int it = 0; it < GOLDEN_MAX_ITERATIONS && b - a > GOLDEN_TOLERANCE * Math.max(Math.abs(a), Math.abs(b));
             it++) {
            if (f1 < f2) {
                a = x1;
                x1 = x2;
                f1 = f2;
                x2 = a + g * (b - a);
                f2 = sign * f.applyAsDouble(x2);
            } else {
                b = x2;
                x2 = x1;
                f2 = f1;
                x1 = b - g * (b - a);
                f1 = sign * f.applyAsDouble(x1);
            }
        }
        return sign * Math.max(f1, f2);
    }
}
