package breakwater.timedomain;

import breakwater.network.PowerNetwork;

import java.util.Locale;

/**
 * The checks a pole–residue model passes before it is returned, else {@link ModelException}: every mode
 * decays (Re p_i &lt; 0, {@link #requireDecaying}); the identity Z(0) = D₀ + Σ r_i/(−p_i)
 * (docs/worst-case.md#the-z0-identity) to {@link #IDENTITY_TOLERANCE} relative; and Z(jω) of the model equal to the
 * frequency-domain engine {@link PowerNetwork#impedance} to {@link #CHECK_TOLERANCE} relative at up to
 * {@value #CHECKED_POLE_FREQUENCIES} pole frequencies, below the slowest and above the fastest pole
 * ({@link #check}). Tested in {@code ModelSelfCheckTest}.
 */
final class ModelSelfCheck {

    /**
     * Relative tolerance of the agreement with the frequency-domain engine. Both sides evaluate the same
     * rational function exactly, so the difference is rounding amplified by cancellation between modes
     * (random networks agree to better than this over 100 Hz … 30 GHz, {@code PoleResidueModelTest}); it
     * is far below the 5e-4 accuracy of the worst case, and a wrong pole misses it by decades.
     */
    static final double CHECK_TOLERANCE = 1e-6;
    /**
     * Tolerance of the Z(0) identity, relative to Z(0). Looser than {@link #CHECK_TOLERANCE} because the
     * sum Σ r/(−p) is dominated by the slowest modes and loses digits when two of them nearly cancel
     * (seen at 1.4e-6 on a real candidate bank whose model agreed with the frequency domain to 1e-6);
     * 1e-5 is still far inside the 5e-4 accuracy of the worst case itself.
     */
    static final double IDENTITY_TOLERANCE = 1e-5;

    /**
     * Smallest accepted damping −Re p/|p| (a quality factor of 5e7): below it a mode is treated as
     * undamped, since its decay is no longer distinguishable from rounding of the eigenvalue.
     */
    static final double MIN_DAMPING = 1e-8;

    /**
     * Rounding allowance of the Z(0) identity, relative to Σ|r_i/p_i| (the size of the terms summed):
     * some 5000 ulps of cancellation between modes, so a model whose terms nearly cancel is not failed
     * for rounding alone; a wrong pole or residue moves the sum far more.
     */
    static final double IDENTITY_ROUNDING = 1e-12;

    /**
     * Pole frequencies checked against the frequency domain, at most (spread over the modes, fastest
     * first): enough to catch a wrong pole in any decade, few enough to keep the check a small part of
     * building a model in the solver's loop.
     */
    static final int CHECKED_POLE_FREQUENCIES = 12;

    /**
     * The check below every pole is at this fraction of the slowest pole's frequency, where Z tends to
     * Z(0) and a missing slow pole shows.
     */
    static final double BELOW_SLOWEST = 0.3;

    /**
     * The check above every pole is at this multiple of the fastest pole's frequency, where Z tends to
     * D₀ + jωL∞ and a wrong high-frequency term or a missing fast pole shows.
     */
    static final int ABOVE_FASTEST = 3;

    private ModelSelfCheck() {
    }

    /** Throws unless every one of the {@code m} poles decays by at least {@link #MIN_DAMPING}. */
    static void requireDecaying(double[] pr, double[] pi, int m) {
        for (int k = 0; k < m; k++) {
            if (!(-pr[k] >= MIN_DAMPING * Math.sqrt(pr[k] * pr[k] + pi[k] * pi[k]))) {
                throw new ModelException(String.format(Locale.ROOT,
                        "network has an undamped or growing mode at %.6g%+.6gj rad/s; every mode of a "
                                + "passive network with losses decays. Maybe a branch has zero resistance "
                                + "everywhere around a loop", pr[k], pi[k]));
            }
        }
    }

    /** The Z(0) identity and the frequency-domain agreement of {@code model} with {@code net}. */
    static void check(PoleResidueModel model, PowerNetwork net) {
        int modes = model.modes;
        double[] pr = model.pr;
        double[] pi = model.pi;
        double[] rr = model.rr;
        double[] ri = model.ri;
        double[] weight = model.weight;
        double constantOhms = model.constantTermOhms();
        // Z(0) identity (docs/worst-case.md#the-z0-identity)
        double z0 = constantOhms;
        double scale = Math.abs(constantOhms);
        for (int k = 0; k < modes; k++) {
            double m = 1.0 / (pr[k] * pr[k] + pi[k] * pi[k]);
            // r/(-p) = -r conj(p)/|p|^2, real part
            double v = -(rr[k] * pr[k] + ri[k] * pi[k]) * m * weight[k];
            z0 += v;
            scale += Math.abs(v);
        }
        double dc = net.dcResistanceOhms();
        if (!(Math.abs(z0 - dc) <= IDENTITY_TOLERANCE * Math.abs(dc) + IDENTITY_ROUNDING * scale)) {
            throw new ModelException(String.format(Locale.ROOT,
                    "pole-residue model fails the identity Z(0) = D + sum r/(-p): %.12g Ohm from the model, "
                            + "%.12g Ohm from the network (%d modes)", z0, dc, modes));
        }
        // frequency-domain agreement
        double fLo = Double.POSITIVE_INFINITY;
        double fHi = 0;
        for (int k = 0; k < modes; k++) {
            double f = Math.sqrt(pr[k] * pr[k] + pi[k] * pi[k]) / (2 * Math.PI);
            fLo = Math.min(fLo, f);
            fHi = Math.max(fHi, f);
        }
        if (modes == 0) {
            PencilEigenvalues.RateRange r = PencilEigenvalues.rateRange(net);
            fLo = r.lowRadPerS() / (2 * Math.PI);
            fHi = r.highRadPerS() / (2 * Math.PI);
        }
        int nf = Math.min(modes, CHECKED_POLE_FREQUENCIES) + 2;
        double[] zm = new double[2];
        double[] zn = new double[2];
        for (int i = 0; i < nf; i++) {
            double f;
            if (i == 0) {
                f = BELOW_SLOWEST * fLo;
            } else if (i == 1) {
                f = ABOVE_FASTEST * fHi;
            } else {
                int k = (i - 2) * Math.max(1, modes / CHECKED_POLE_FREQUENCIES);
                f = (pi[k] > 0 ? pi[k] : Math.abs(pr[k])) / (2 * Math.PI);
            }
            model.impedance(f, zm);
            net.impedance(f, zn);
            double er = zm[0] - zn[0];
            double ei = zm[1] - zn[1];
            double err = Math.sqrt(er * er + ei * ei);
            double mag = Math.sqrt(zn[0] * zn[0] + zn[1] * zn[1]);
            if (!(err <= CHECK_TOLERANCE * mag)) {
                throw new ModelException(String.format(Locale.ROOT,
                        "pole-residue model disagrees with the network impedance at %.6g Hz: "
                                + "|dZ|/|Z| = %.3g (limit %.1g, %d modes); the network is ill-conditioned",
                        f, err / mag, CHECK_TOLERANCE, modes));
            }
        }
    }
}
