package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.junit.jupiter.api.Test;

import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The eigenvalue search of the descriptor pencil ({@link PencilEigenvalues}), before any Newton polishing:
 * the first guesses must already be the circuit's natural frequencies to the accuracy of an eigenvalue
 * routine.
 */
class PencilEigenvaluesTest {

    /** A pole p = re + j·im. */
    private record Pole(double re, double im) {
        double abs() {
            return Math.hypot(re, im);
        }
    }

    /**
     * Handbook closed form (series RLC circuit): with the load port open, the regulator R_reg + sL_reg in
     * series with one branch R_c + sL_c + 1/(sC) to ground is one series loop of R = R_reg + R_c,
     * L = L_reg + L_c and C, whose natural frequencies are −R/2L ± j√(1/LC − (R/2L)²). The pencil has three
     * dynamic states (two inductor currents, one capacitor voltage) but the open port ties the two currents
     * together, so the third eigenvalue is infinite and must be dropped. Tolerance 1e-12 relative: an
     * eigenvalue routine is backward stable, and this small problem is well conditioned (measured 1.7e-15).
     */
    @Test
    void seriesRlcLoopGivesTheHandbookPoles() {
        double rReg = 1e-3;
        double lReg = 2e-9;
        double rC = 4e-3;
        double lC = 0.5e-9;
        double c = 10e-6;
        PowerNetwork net = new PowerNetwork(rReg, lReg, List.of(new SeriesBranch("c", rC, lC, c)), false, 0, 0,
                List.of());
        double r = rReg + rC;
        double l = lReg + lC;
        double sigma = -r / (2 * l);
        double omega = Math.sqrt(1 / (l * c) - sigma * sigma);
        Pole[] found = poles(PencilEigenvalues.candidatePoles(net));
        assertThat(found).hasSize(2);
        Pole upper = found[0].im() > 0 ? found[0] : found[1];
        Pole lower = found[0].im() > 0 ? found[1] : found[0];
        double size = Math.hypot(sigma, omega);
        assertThat(Math.hypot(upper.re() - sigma, upper.im() - omega)).isLessThanOrEqualTo(1e-12 * size);
        assertThat(Math.hypot(lower.re() - sigma, lower.im() + omega)).isLessThanOrEqualTo(1e-12 * size);
    }

    /**
     * Reference: Commons Math {@link EigenDecomposition} (a general-purpose library) of the state matrix of
     * the same circuit written independently from Kirchhoff's laws ({@link CircuitOde}; its matrix is read
     * column by column from the derivatives of unit states with the load at rest). The two must find the
     * same natural frequencies, every one of them (the moderate network's 10 and the realistic one's 20,
     * over about five decades). Tolerance 1e-9 of each |λ|: both routines are backward stable, so the slow
     * eigenvalues of a matrix whose norm the fast modes set lose a few digits (measured at most 3.4e-11).
     */
    @Test
    void agreesWithCommonsMathOnTheKirchhoffStateMatrix() {
        for (PowerNetwork net : List.of(Networks.moderate(), Networks.realistic())) {
            Pole[] mine = poles(PencilEigenvalues.candidatePoles(net));
            CircuitOde ode = new CircuitOde(net);
            int n = ode.getDimension();
            double[][] a = new double[n][n];
            double[] y = new double[n];
            double[] dy = new double[n];
            for (int j = 0; j < n; j++) {
                Arrays.fill(y, 0);
                y[j] = 1;
                ode.computeDerivatives(0, y, dy);
                for (int i = 0; i < n; i++) {
                    a[i][j] = dy[i];
                }
            }
            EigenDecomposition ref = new EigenDecomposition(new Array2DRowRealMatrix(a));
            double[] re = ref.getRealEigenvalues();
            double[] im = ref.getImagEigenvalues();
            double[] interleaved = new double[2 * n];
            for (int k = 0; k < n; k++) {
                interleaved[2 * k] = re[k];
                interleaved[2 * k + 1] = im[k];
            }
            Pole[] theirs = poles(interleaved);
            assertThat(mine).hasSameSizeAs(theirs);
            for (Pole p : theirs) {
                Pole nearest = mine[0];
                for (Pole q : mine) {
                    if (Math.hypot(q.re() - p.re(), q.im() - p.im())
                            < Math.hypot(nearest.re() - p.re(), nearest.im() - p.im())) {
                        nearest = q;
                    }
                }
                double err = Math.hypot(nearest.re() - p.re(), nearest.im() - p.im());
                assertThat(err).as("pole %s", p).isLessThanOrEqualTo(1e-9 * p.abs());
            }
        }
    }

    /** Interleaved re/im pairs as poles, by |p| descending. */
    private static Pole[] poles(double[] interleaved) {
        Pole[] p = new Pole[interleaved.length / 2];
        for (int k = 0; k < p.length; k++) {
            p[k] = new Pole(interleaved[2 * k], interleaved[2 * k + 1]);
        }
        Arrays.sort(p, Comparator.comparingDouble(Pole::abs).reversed());
        return p;
    }
}
