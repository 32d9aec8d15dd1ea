package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** Newton's method on Y(s) = 0, the residues 1/Y'(p) and Maehly's deflation ({@link ZeroPolisher}). */
class ZeroPolisherTest {

    private static final double R_REG = 1e-3;
    private static final double L_REG = 2e-9;
    private static final double R_C = 4e-3;
    private static final double L_C = 0.5e-9;
    private static final double C = 10e-6;

    /** Regulator R_reg + sL_reg and one branch R_c + sL_c + 1/(sC): with the port open, one series RLC loop. */
    private static PowerNetwork loop() {
        return new PowerNetwork(R_REG, L_REG, List.of(new SeriesBranch("c", R_C, L_C, C)), false, 0, 0, List.of());
    }

    /** Handbook closed form of the loop's upper pole: −R/2L + j√(1/LC − (R/2L)²), R and L the loop's totals. */
    private static Complex loopPole() {
        double r = R_REG + R_C;
        double l = L_REG + L_C;
        double sigma = -r / (2 * l);
        return new Complex(sigma, Math.sqrt(1 / (l * C) - sigma * sigma));
    }

    /**
     * Reference: the handbook pole of the series RLC loop. Newton's method from a guess 10 % off in both
     * parts lands on it to full precision (tolerance 1e-13 relative: the closed form itself is exact to a
     * few ulps, and the polished zero to its step tolerance; measured 4e-17).
     */
    @Test
    void newtonFindsTheHandbookPoleFromARoughGuess() {
        Complex p = loopPole();
        double[] root = new double[2];
        assertThat(ZeroPolisher.newton(new Ladder(loop()), 1.1 * p.getReal(), 0.9 * p.getImaginary(), root)).isTrue();
        assertThat(Math.hypot(root[0] - p.getReal(), root[1] - p.getImaginary())).isLessThanOrEqualTo(1e-13 * p.abs());
    }

    /**
     * Reference: partial fractions (handbook). Z = (R_reg + sL_reg)(R_c + sL_c + 1/(sC))/(R + sL + 1/(sC)),
     * and R + sL + 1/(sC) = L(s − p)(s − p̄)/s, so the residue at p is N(p)·p/(L·(p − p̄)) with N the
     * numerator. The polisher's residue 1/Y'(p) must equal it (tolerance 1e-12 relative: both are
     * closed forms in double precision, evaluated at a pole known to rounding; measured 2e-16).
     */
    @Test
    void residueIsTheHandbookPartialFraction() {
        Complex p = loopPole();
        Complex numerator = new Complex(R_REG, 0).add(p.multiply(L_REG))
                .multiply(new Complex(R_C, 0).add(p.multiply(L_C)).add(p.multiply(C).reciprocal()));
        Complex residue = numerator.multiply(p).divide(p.subtract(p.conjugate()).multiply(L_REG + L_C));
        ZeroPolisher.Zeros z = ZeroPolisher.polish(new Ladder(loop()),
                new double[] {1.1 * p.getReal(), 0.9 * p.getImaginary()}, 2, false);
        assertThat(z.count()).isEqualTo(1);
        assertThat(Math.hypot(z.residueRe()[0] - residue.getReal(), z.residueIm()[0] - residue.getImaginary()))
                .isLessThanOrEqualTo(1e-12 * residue.abs());
    }

    /**
     * Circuit theory: two identical branches side by side have a natural frequency the load cannot see
     * (current circulating between them: the loop of both branches, 2R, 2L and C/2). The pencil finds it;
     * Newton's method on Y must not, so the zeros found number the degree less that pair.
     */
    @Test
    void aModeTheLoadCannotSeeIsDropped() {
        SeriesBranch b = new SeriesBranch("x", 10e-3, 0.7e-9, 1e-6);
        PowerNetwork twins = new PowerNetwork(0.5e-3, 10e-9, List.of(b, b), false, 0, 0, List.of());
        double[] guesses = PencilEigenvalues.candidatePoles(twins);
        int degree = guesses.length / 2;
        // five states (regulator current, current and voltage of each branch), but with the port open KCL
        // ties the three inductor currents together: four finite natural frequencies, two pairs
        assertThat(degree).isEqualTo(4);
        ZeroPolisher.Zeros z = ZeroPolisher.polish(new Ladder(twins), guesses, degree, false);
        int weighted = 0;
        for (int k = 0; k < z.count(); k++) {
            weighted += z.poleIm()[k] == 0.0 ? 1 : 2;
        }
        assertThat(weighted).isEqualTo(degree - 2);
        // the hidden pair: the loop of the two branches (2R, 2L, C/2): −R/2L ± j√(1/LC − (R/2L)²)
        double sigma = -b.resistanceOhms() / (2 * b.inductanceH());
        double omega = Math.sqrt(1 / (b.inductanceH() * b.capacitanceF()) - sigma * sigma);
        for (int k = 0; k < z.count(); k++) {
            assertThat(Math.hypot(z.poleRe()[k] - sigma, z.poleIm()[k] - omega))
                    .isGreaterThan(1e-3 * Math.hypot(sigma, omega));
        }
    }

    /**
     * Maehly's correction leaves the zeros not yet found in place: with every zero but one deflated, a
     * guess 0.1 % off the remaining one converges to it. Reference: the eigenvalue-search model of the
     * same network ({@link PoleResidueModel#of}). Tolerance 1e-8 relative: the deflated iteration stops
     * at steps of 1e-10 of |s| and is polished on Y afterwards.
     */
    @Test
    void deflatedNewtonFindsTheZeroLeft() {
        for (PowerNetwork net : List.of(Networks.moderate(), Networks.realistic())) {
            PoleResidueModel ref = PoleResidueModel.of(net);
            Ladder ladder = new Ladder(net);
            int n = ref.modeCount();
            double[] out = new double[2];
            for (int k = 0; k < n; k++) {
                double[] zr = new double[n - 1];
                double[] zi = new double[n - 1];
                for (int j = 0, c = 0; j < n; j++) {
                    if (j != k) {
                        zr[c] = ref.pr[j];
                        zi[c++] = ref.pi[j];
                    }
                }
                double size = Math.hypot(ref.pr[k], ref.pi[k]);
                assertThat(ZeroPolisher.deflatedNewton(ladder, ref.pr[k] * (1 + 1e-3), ref.pi[k] * (1 - 1e-3), zr, zi,
                        n - 1, out)).as("mode %d of %d", k, n).isTrue();
                assertThat(Math.hypot(out[0] - ref.pr[k], Math.abs(out[1]) - ref.pi[k])).as("mode %d of %d", k, n)
                        .isLessThanOrEqualTo(1e-8 * size);
            }
        }
    }

    /**
     * Maehly's correction keeps the iteration away from the zeros found: started 10 % off a zero that is
     * deflated, it either fails or, once polished on Y, ends on another zero of the network (the
     * eigenvalue-search model's), never on the deflated one or its conjugate.
     */
    @Test
    void deflatedNewtonNeverReturnsToAZeroFound() {
        int moved = 0;
        for (PowerNetwork net : List.of(Networks.moderate(), Networks.realistic())) {
            PoleResidueModel ref = PoleResidueModel.of(net);
            Ladder ladder = new Ladder(net);
            double[] out = new double[2];
            double[] root = new double[2];
            for (int k = 0; k < ref.modeCount(); k++) {
                double[] zr = {ref.pr[k]};
                double[] zi = {ref.pi[k]};
                if (!ZeroPolisher.deflatedNewton(ladder, ref.pr[k] * 1.1, ref.pi[k] * 0.9, zr, zi, 1, out)) {
                    continue; // no zero reached from here: allowed, the eigenvalue search decides then
                }
                moved++;
                assertThat(ZeroPolisher.newton(ladder, out[0], out[1], root)).isTrue();
                double qi = Math.abs(root[1]);
                double size = Math.hypot(root[0], qi);
                assertThat(Math.hypot(root[0] - ref.pr[k], qi - ref.pi[k])).as("mode %d", k)
                        .isGreaterThan(1e-6 * size);
                double nearest = Double.POSITIVE_INFINITY;
                for (int j = 0; j < ref.modeCount(); j++) {
                    nearest = Math.min(nearest, Math.hypot(root[0] - ref.pr[j], qi - ref.pi[j]));
                }
                assertThat(nearest).as("mode %d", k).isLessThanOrEqualTo(1e-12 * size);
            }
        }
        // the two networks' 15 modes: 5 of these starts reach another zero (measured)
        assertThat(moved).isGreaterThanOrEqualTo(3);
    }
}
