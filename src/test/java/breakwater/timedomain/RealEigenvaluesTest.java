package breakwater.timedomain;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.junit.jupiter.api.Test;

import java.util.Arrays;
import java.util.Comparator;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class RealEigenvaluesTest {

    /** Reference: Commons Math EigenDecomposition (a general-purpose library) on random nonsymmetric matrices. */
    @Test
    void agreesWithCommonsMathOnRandomMatrices() {
        Random rnd = new Random(7);
        for (int trial = 0; trial < 200; trial++) {
            int n = 1 + rnd.nextInt(24);
            double[][] a = new double[n][n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    // entries over several decades, as in an unscaled circuit matrix
                    a[i][j] = rnd.nextGaussian() * Math.pow(10, rnd.nextInt(7) - 3);
                }
            }
            double[] wr = new double[n];
            double[] wi = new double[n];
            RealEigenvalues.compute(a, n, wr, wi);
            EigenDecomposition ref = new EigenDecomposition(new Array2DRowRealMatrix(a));
            Eigenvalue[] mine = sorted(wr, wi);
            Eigenvalue[] theirs = sorted(ref.getRealEigenvalues(), ref.getImagEigenvalues());
            double norm = 0;
            for (double[] row : a) {
                for (double v : row) {
                    norm = Math.max(norm, Math.abs(v));
                }
            }
            // eigenvalues of a nonsymmetric matrix are only as well conditioned as the matrix allows:
            // both are backward stable, so agreement to ~1e-8 of the norm is the fair expectation here
            for (int k = 0; k < n; k++) {
                assertThat(mine[k].re()).isCloseTo(theirs[k].re(), within(1e-7 * norm * n));
                assertThat(mine[k].im()).isCloseTo(theirs[k].im(), within(1e-7 * norm * n));
            }
        }
    }

    /** Reference: the companion matrix of (x−1)(x−2)(x²+2x+5) has eigenvalues 1, 2, −1 ± 2j (algebra). */
    @Test
    void companionMatrixOfKnownPolynomial() {
        // (x-1)(x-2) = x^2 - 3x + 2; times (x^2 + 2x + 5) = x^4 - x^3 + x^2 - 11x + 10
        double[][] a = {
                {1, -1, 11, -10},
                {1, 0, 0, 0},
                {0, 1, 0, 0},
                {0, 0, 1, 0}};
        double[] wr = new double[4];
        double[] wi = new double[4];
        RealEigenvalues.compute(a, 4, wr, wi);
        Eigenvalue[] s = sorted(wr, wi);
        assertThat(s[0].re()).isCloseTo(-1, within(1e-12));
        assertThat(Math.abs(s[0].im())).isCloseTo(2, within(1e-12));
        assertThat(s[2].re()).isCloseTo(1, within(1e-12));
        assertThat(s[3].re()).isCloseTo(2, within(1e-12));
    }

    /** An eigenvalue re + j·im. */
    private record Eigenvalue(double re, double im) {
    }

    /** The eigenvalues by real part (rounded to 1e-6, so that conjugates stay together), then imaginary part. */
    private static Eigenvalue[] sorted(double[] wr, double[] wi) {
        Eigenvalue[] v = new Eigenvalue[wr.length];
        for (int i = 0; i < wr.length; i++) {
            v[i] = new Eigenvalue(wr[i], wi[i]);
        }
        Arrays.sort(v, Comparator.<Eigenvalue>comparingDouble(x -> Math.round(x.re() * 1e6) / 1e6)
                .thenComparingDouble(Eigenvalue::im));
        return v;
    }
}
