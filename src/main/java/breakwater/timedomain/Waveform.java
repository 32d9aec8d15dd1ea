package breakwater.timedomain;

import java.util.Arrays;
import java.util.Objects;

/**
 * A load pattern laid out in time with the load voltage it causes, for plots and the worst-case CSV.
 * Time 0 is the start of the pattern (its earliest lag); the worst instant is {@link #worstInstantS()}
 * = the pattern's length T; after it the load holds its value at the worst instant for a short settle
 * window (10 % of T, at least ten time constants of the fastest mode). Before time 0 the load is taken to
 * have held its earliest value for ever (steady state).
 *
 * <p>Voltage (docs/worst-case.md#notation): v(t) = V_nom − Z(0)·I_min − ΔI·(h ∗ u)(t), computed exactly
 * from the pole–residue form: every mode's state x' = p·x + δu is advanced across each interval on which
 * u is linear by x_b = e^{pΔ}x_a + Δ·(u_a·f_R(pΔ) + u_b·f_L(pΔ)), with f_R(z) = (z e^z − e^z + 1)/z²
 * and f_L(z) = (e^z − 1 − z)/z² (power series for |z| &lt; 0.5, no cancellation), plus D₀·δu and
 * L∞·du/dt (left derivative). Exact at every sample up to rounding; samples include every breakpoint of
 * the pattern (jumps appear as two rows with the same time), so re-simulating the piecewise-linear
 * current reproduces the voltage exactly. Between breakpoints the spacing is at most 1/16 of the fastest
 * mode's period near the worst instant, growing to 2 % of the distance from it further away.
 *
 * @param timeS        ascending (non-decreasing) times, s
 * @param loadCurrentA load current i(t) ∈ [I_min, I_min + ΔI], A
 * @param voltageV     load voltage v(t), V
 * @param worstInstantS time of the worst instant, s
 */
public record Waveform(double[] timeS, double[] loadCurrentA, double[] voltageV, double worstInstantS) {

    /**
     * Fill-in samples per period of the fastest mode near the worst instant: 16 draw its ringing as a
     * smooth curve in the report and keep the sampled minimum within about 2 % of the ringing's amplitude
     * of the true one (1 − cos(π/16)) between breakpoints; the breakpoints themselves, where the
     * extremes of the worst pattern lie, are always samples.
     */
    private static final int SAMPLES_PER_PERIOD = 16;

    /** Without modes there is no period: the pattern's length (at least {@link #FLOOR_S}) is cut in 64. */
    private static final int SAMPLES_WITHOUT_MODES = 64;

    /** Time scale used where the model has none (no modes, or an empty pattern), s. */
    private static final double FLOOR_S = 1e-9;

    /**
     * Away from the worst instant the spacing grows to this fraction of the distance from it, so a long
     * pattern costs about 120 samples per decade of time (ln 10/ln 1.02) instead of millions.
     */
    private static final double SPACING_GROWTH = 0.02;

    /**
     * A fill-in sample closer than this fraction of a step to the next breakpoint is left out: the
     * breakpoint follows anyway, and two nearly equal times would only crowd the CSV.
     */
    private static final double MERGE_FRACTION = 0.25;

    /** The settle window after the worst instant is at least this fraction of the pattern's length. */
    private static final double SETTLE_FRACTION = 0.1;

    /**
     * ... and at least this many time constants 1/|p| of the fastest mode, long enough to show the
     * recovery from the worst instant.
     */
    private static final int SETTLE_TIME_CONSTANTS = 10;

    /**
     * |z|² below which the hat integrals take the power series: below |z| = 0.5 the closed forms lose
     * digits to cancellation (e^z − 1 − z ≈ z²/2 from terms near 1; all of them as z → 0), while 18 terms of
     * the series are exact to 1e-17 ({@code WaveformTest.hatIntegralsMatchQuadrature} checks both branches and their agreement at
     * the switch).
     */
    private static final double SERIES_RADIUS_SQUARED = 0.25;

    /** The series runs over m = 2 … this (18 terms): the first omitted term is below 19·0.5¹⁸/20! ≈ 3e-23. */
    private static final int SERIES_LAST_TERM = 19;

    public Waveform {
        Objects.requireNonNull(timeS, "timeS");
        if (timeS.length != loadCurrentA.length || timeS.length != voltageV.length || timeS.length == 0) {
            throw new IllegalArgumentException("waveform arrays must have the same, non-zero length");
        }
        timeS = timeS.clone();
        loadCurrentA = loadCurrentA.clone();
        voltageV = voltageV.clone();
    }

    /**
     * Lays {@code pattern} out in time and computes the load voltage.
     *
     * @param model            pole–residue model of the load node
     * @param pattern          normalised pattern u(lag)
     * @param deltaIA          ΔI = I_max − I_min, A, &ge; 0
     * @param minCurrentA      I_min, A
     * @param nominalVoltageV  V_nom, V
     * @param dcResistanceOhms Z(0), Ω
     */
    public static Waveform of(PoleResidueModel model, LoadPattern pattern, double deltaIA, double minCurrentA,
                              double nominalVoltageV, double dcResistanceOhms) {
        if (!(deltaIA >= 0) || !Double.isFinite(deltaIA) || !Double.isFinite(minCurrentA)
                || !Double.isFinite(nominalVoltageV) || !Double.isFinite(dcResistanceOhms)) {
            throw new IllegalArgumentException("waveform needs finite ΔI >= 0, I_min, V_nom and Z(0)");
        }
        Samples samples = samples(model, pattern);
        double[] t = samples.timeS();
        double[] u = samples.u();
        int n = t.length;
        double[] y = response(model, t, u);
        double uFar = pattern.value(pattern.size() - 1);
        double base = nominalVoltageV - dcResistanceOhms * minCurrentA - deltaIA * dcResistanceOhms * uFar;
        double[] cur = new double[n];
        double[] volt = new double[n];
        for (int i = 0; i < n; i++) {
            cur[i] = minCurrentA + deltaIA * u[i];
            volt[i] = base - deltaIA * y[i];
        }
        return new Waveform(t, cur, volt, pattern.lengthS());
    }

    /** Times (copy). */
    @Override
    public double[] timeS() {
        return timeS.clone();
    }

    /** Load currents (copy). */
    @Override
    public double[] loadCurrentA() {
        return loadCurrentA.clone();
    }

    /** Voltages (copy). */
    @Override
    public double[] voltageV() {
        return voltageV.clone();
    }

    /** Number of samples. */
    public int size() {
        return timeS.length;
    }

    /** The lowest voltage in the waveform, V. */
    public double minVoltageV() {
        return Arrays.stream(voltageV).min().orElseThrow();
    }

    /** The highest voltage in the waveform, V. */
    public double maxVoltageV() {
        return Arrays.stream(voltageV).max().orElseThrow();
    }

    /**
     * Where the waveform is sampled: pattern breakpoints plus fill-in points, then the settle window.
     *
     * @param timeS ascending (non-decreasing) times, s
     * @param u     the normalised load u at each time
     */
    record Samples(double[] timeS, double[] u) {
    }

    /** The samples of the waveform of {@code p} (see {@link Samples}). */
    static Samples samples(PoleResidueModel model, LoadPattern p) {
        double total = p.lengthS();
        double fast = 0;
        for (int k = 0; k < model.modes; k++) {
            fast = Math.max(fast, Math.hypot(model.pr[k], model.pi[k]));
        }
        double fine = fast > 0 ? 2 * Math.PI / fast / SAMPLES_PER_PERIOD
                : Math.max(total, FLOOR_S) / SAMPLES_WITHOUT_MODES;
        double settle = Math.max(SETTLE_FRACTION * total, fast > 0 ? SETTLE_TIME_CONSTANTS / fast : FLOOR_S);
        DoubleList times = new DoubleList(2 * p.size() + 128);
        DoubleList values = new DoubleList(2 * p.size() + 128);
        int m = p.size();
        double prevT = total - p.lagS(m - 1);
        double prevU = p.value(m - 1);
        times.add(prevT);
        values.add(prevU);
        for (int i = m - 2; i >= 0; i--) {
            double tb = total - p.lagS(i);
            double ub = p.value(i);
            double ta = prevT;
            double ua = prevU;
            if (tb > ta) {
                double s = ta;
                while (true) {
                    double step = Math.max(fine, SPACING_GROWTH * (total - s));
                    double next = s + step;
                    if (next >= tb - MERGE_FRACTION * step) {
                        break;
                    }
                    times.add(next);
                    values.add(ua + (ub - ua) * (next - ta) / (tb - ta));
                    s = next;
                }
            }
            times.add(tb);
            values.add(ub);
            prevT = tb;
            prevU = ub;
        }
        double u0 = p.value(0);
        double s = total;
        double end = total + settle;
        while (s < end) {
            double step = Math.max(fine, SPACING_GROWTH * (s - total));
            s = Math.min(end, s + step);
            times.add(s);
            values.add(u0);
        }
        return new Samples(times.toArray(), values.toArray());
    }

    /** (h ∗ δu)(t_i) + D₀·δu + L∞·δu' at every sample, δu = u − u(earliest), exact per linear piece. */
    static double[] response(PoleResidueModel model, double[] t, double[] u) {
        int n = t.length;
        int m = model.modes;
        double[] xr = new double[m];
        double[] xi = new double[m];
        double[] y = new double[n];
        double u0 = u[0];
        double slope = 0;
        double[] f = new double[4];
        for (int i = 1; i < n; i++) {
            double dt = t[i] - t[i - 1];
            double a = u[i - 1] - u0;
            double b = u[i] - u0;
            if (dt > 0) {
                slope = (u[i] - u[i - 1]) / dt;
                for (int k = 0; k < m; k++) {
                    double zr = model.pr[k] * dt;
                    double zi = model.pi[k] * dt;
                    double e = Math.exp(zr);
                    double er = e * Math.cos(zi);
                    double ei = e * Math.sin(zi);
                    hatIntegrals(zr, zi, er, ei, f);
                    // x ← E·x + Δ·(a·f_R + b·f_L)
                    double nr = er * xr[k] - ei * xi[k] + dt * (a * f[0] + b * f[2]);
                    double ni = er * xi[k] + ei * xr[k] + dt * (a * f[1] + b * f[3]);
                    xr[k] = nr;
                    xi[k] = ni;
                }
            }
            double v = model.constantTermOhms() * b + model.seriesInductanceH() * slope;
            for (int k = 0; k < m; k++) {
                v += model.weight[k] * (model.rr[k] * xr[k] - model.ri[k] * xi[k]);
            }
            y[i] = v;
        }
        y[0] = 0;
        return y;
    }

    /**
     * f_R(z) = (z e^z − e^z + 1)/z² into out[0..1], f_L(z) = (e^z − 1 − z)/z² into out[2..3], for complex
     * z with e^z = (er, ei) given. ∫₀^Δ e^{pv}·v/Δ dv = Δ·f_R(pΔ), ∫₀^Δ e^{pv}(Δ − v)/Δ dv = Δ·f_L(pΔ).
     * Power series Σ (m−1) z^{m−2}/m! and Σ z^{m−2}/m! for |z| &lt; 0.5 (18 terms: error &lt; 1e-17).
     */
    static void hatIntegrals(double zr, double zi, double er, double ei, double[] out) {
        if (zr * zr + zi * zi < SERIES_RADIUS_SQUARED) {
            hatIntegralsSeries(zr, zi, out);
        } else {
            hatIntegralsClosed(zr, zi, er, ei, out);
        }
    }

    /** The power-series branch of {@link #hatIntegrals}. */
    static void hatIntegralsSeries(double zr, double zi, double[] out) {
        {
            // Horner over m = SERIES_LAST_TERM … 2
            double fr = 0;
            double fi = 0;
            double gr = 0;
            double gi = 0;
            double[] inv = INV_FACTORIAL;
            for (int mm = SERIES_LAST_TERM; mm >= 2; mm--) {
                // f = f·z + (m−1)/m!,  g = g·z + 1/m!
                double t1 = fr * zr - fi * zi + (mm - 1) * inv[mm];
                fi = fr * zi + fi * zr;
                fr = t1;
                double t2 = gr * zr - gi * zi + inv[mm];
                gi = gr * zi + gi * zr;
                gr = t2;
            }
            out[0] = fr;
            out[1] = fi;
            out[2] = gr;
            out[3] = gi;
        }
    }

    /** The closed-form branch of {@link #hatIntegrals}. */
    static void hatIntegralsClosed(double zr, double zi, double er, double ei, double[] out) {
        // 1/z²
        double z2r = zr * zr - zi * zi;
        double z2i = 2 * zr * zi;
        double im = 1.0 / (z2r * z2r + z2i * z2i);
        double qr = z2r * im;
        double qi = -z2i * im;
        // z e^z − e^z + 1
        double ar = zr * er - zi * ei - er + 1;
        double ai = zr * ei + zi * er - ei;
        out[0] = ar * qr - ai * qi;
        out[1] = ar * qi + ai * qr;
        // e^z − 1 − z
        double br = er - 1 - zr;
        double bi = ei - zi;
        out[2] = br * qr - bi * qi;
        out[3] = br * qi + bi * qr;
    }

    private static final double[] INV_FACTORIAL = new double[21];

    static {
        double f = 1;
        INV_FACTORIAL[0] = 1;
        for (int i = 1; i < INV_FACTORIAL.length; i++) {
            f *= i;
            INV_FACTORIAL[i] = 1 / f;
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Waveform w && Arrays.equals(timeS, w.timeS) && Arrays.equals(loadCurrentA, w.loadCurrentA)
                && Arrays.equals(voltageV, w.voltageV) && worstInstantS == w.worstInstantS;
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(timeS) * 31 + Arrays.hashCode(voltageV);
    }

    @Override
    public String toString() {
        return "Waveform[" + timeS.length + " samples, worst instant " + worstInstantS + " s]";
    }
}
