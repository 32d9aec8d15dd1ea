package breakwater.timedomain;

/**
 * Eigenvalues (no vectors) of a small dense real matrix: balancing by powers of two, reduction to upper
 * Hessenberg form by stabilised elementary similarity transformations, then the shifted QR algorithm
 * with Francis double shifts. This is the classical EISPACK route (balanc/elmhes/hqr, as described in
 * Wilkinson &amp; Reinsch, <i>Handbook for Automatic Computation II</i>, and in <i>Numerical
 * Recipes</i> §11.5–11.6). Backward stable: the eigenvalues are exact for a matrix within a few ulps of
 * the balanced input, which is ample for first guesses that are polished by Newton's method afterwards.
 * Works on primitive arrays; one allocation of the working copy per call.
 */
final class RealEigenvalues {

    /**
     * QR iterations allowed for one eigenvalue (or pair) to split off before the search gives up with a
     * {@link ModelException} (the published routine stops at 30; from memory). Francis steps converge
     * quadratically, so a few per eigenvalue are usual; the doubled room is a margin for badly scaled
     * circuit matrices, and running out is reported, never turned into a number.
     */
    private static final int MAX_ITERATIONS_PER_EIGENVALUE = 60;

    /**
     * Balancing rescales a row and column only if that lowers their norm sum below this fraction of its
     * value (the published routine's value): smaller gains are not worth another sweep.
     */
    private static final double BALANCE_GAIN = 0.95;

    /**
     * Every this many iterations without a split the QR step takes an exceptional shift, which breaks
     * the cycles that the Francis shift can fall into (the published routine does it at iterations 10 and
     * 20).
     */
    private static final int EXCEPTIONAL_SHIFT_EVERY = 10;

    /**
     * The exceptional shift of the published routine: with s = |a_{n,n−1}| + |a_{n−1,n−2}|, the double-shift
     * step takes x = y = 0.75·s and w = −0.4375·s² in place of the trailing 2×2 block's values. The values
     * are those of the published algorithm, not tuned here.
     */
    private static final double EXCEPTIONAL_SHIFT = 0.75;

    /** See {@link #EXCEPTIONAL_SHIFT}: the product term of the exceptional shift, w = −0.4375·s². */
    private static final double EXCEPTIONAL_SHIFT_PRODUCT = -0.4375;

    private RealEigenvalues() {
    }

    /**
     * Eigenvalues of the n×n matrix {@code a} (row-major {@code a[i][j]}, left unchanged).
     *
     * @param wr out: real parts, length ≥ n
     * @param wi out: imaginary parts, length ≥ n; complex pairs are adjacent, positive part first
     * @throws ModelException when the QR iteration does not converge
     */
    static void compute(double[][] a, int n, double[] wr, double[] wi) {
        // 1-based working copy keeps the classical index arithmetic readable
        double[][] h = new double[n + 1][n + 1];
        for (int i = 0; i < n; i++) {
            System.arraycopy(a[i], 0, h[i + 1], 1, n);
        }
        balance(h, n);
        hessenberg(h, n);
        qr(h, n, wr, wi);
    }

    private static void balance(double[][] a, int n) {
        final double radix = 2.0;
        final double sqrdx = radix * radix;
        boolean done = false;
        while (!done) {
            done = true;
            for (int i = 1; i <= n; i++) {
                double r = 0.0;
                double c = 0.0;
                for (int j = 1; j <= n; j++) {
                    if (j != i) {
                        c += Math.abs(a[j][i]);
                        r += Math.abs(a[i][j]);
                    }
                }
                if (c != 0.0 && r != 0.0) {
                    double g = r / radix;
                    double f = 1.0;
                    double s = c + r;
                    while (c < g) {
                        f *= radix;
                        c *= sqrdx;
                    }
                    g = r * radix;
                    while (c > g) {
                        f /= radix;
                        c /= sqrdx;
                    }
                    if ((c + r) / f < BALANCE_GAIN * s) {
                        done = false;
                        g = 1.0 / f;
                        for (int j = 1; j <= n; j++) {
                            a[i][j] *= g;
                        }
                        for (int j = 1; j <= n; j++) {
                            a[j][i] *= f;
                        }
                    }
                }
            }
        }
    }

    private static void hessenberg(double[][] a, int n) {
        for (int m = 2; m < n; m++) {
            double x = 0.0;
            int i = m;
            for (int j = m; j <= n; j++) {
                if (Math.abs(a[j][m - 1]) > Math.abs(x)) {
                    x = a[j][m - 1];
                    i = j;
                }
            }
            if (i != m) {
                for (int j = m - 1; j <= n; j++) {
                    double t = a[i][j];
                    a[i][j] = a[m][j];
                    a[m][j] = t;
                }
                for (int j = 1; j <= n; j++) {
                    double t = a[j][i];
                    a[j][i] = a[j][m];
                    a[j][m] = t;
                }
            }
            if (x != 0.0) {
                for (i = m + 1; i <= n; i++) {
                    double y = a[i][m - 1];
                    if (y != 0.0) {
                        y /= x;
                        a[i][m - 1] = y;
                        for (int j = m; j <= n; j++) {
                            a[i][j] -= y * a[m][j];
                        }
                        for (int j = 1; j <= n; j++) {
                            a[j][m] += y * a[j][i];
                        }
                    }
                }
            }
        }
        // the multipliers stored below the subdiagonal are not part of the Hessenberg matrix
        for (int i = 3; i <= n; i++) {
            for (int j = 1; j <= i - 2; j++) {
                a[i][j] = 0.0;
            }
        }
    }

    private static void qr(double[][] a, int n, double[] wr, double[] wi) {
        double anorm = 0.0;
        for (int i = 1; i <= n; i++) {
            for (int j = Math.max(i - 1, 1); j <= n; j++) {
                anorm += Math.abs(a[i][j]);
            }
        }
        int nn = n;
        double t = 0.0;
        double p = 0;
        double q = 0;
        double r = 0;
        double x;
        double y;
        double z;
        double w;
        double s;
        while (nn >= 1) {
            int its = 0;
            int l;
            do {
                for (l = nn; l >= 2; l--) {
                    s = Math.abs(a[l - 1][l - 1]) + Math.abs(a[l][l]);
                    if (s == 0.0) {
                        s = anorm;
                    }
                    if (Math.abs(a[l][l - 1]) + s == s) {
                        a[l][l - 1] = 0.0;
                        break;
                    }
                }
                x = a[nn][nn];
                if (l == nn) {
                    wr[nn - 1] = x + t;
                    wi[nn - 1] = 0.0;
                    nn--;
                } else {
                    y = a[nn - 1][nn - 1];
                    w = a[nn][nn - 1] * a[nn - 1][nn];
                    if (l == nn - 1) {
                        p = 0.5 * (y - x);
                        q = p * p + w;
                        z = Math.sqrt(Math.abs(q));
                        x += t;
                        if (q >= 0.0) {
                            z = p + Math.copySign(z, p);
                            wr[nn - 2] = x + z;
                            wr[nn - 1] = x + z;
                            if (z != 0.0) {
                                wr[nn - 1] = x - w / z;
                            }
                            wi[nn - 2] = 0.0;
                            wi[nn - 1] = 0.0;
                        } else {
                            wr[nn - 2] = x + p;
                            wr[nn - 1] = x + p;
                            wi[nn - 2] = z;
                            wi[nn - 1] = -z;
                        }
                        nn -= 2;
                    } else {
                        if (its == MAX_ITERATIONS_PER_EIGENVALUE) {
                            throw new ModelException("eigenvalue iteration did not converge in "
                                    + MAX_ITERATIONS_PER_EIGENVALUE + " steps (matrix of order " + n + ")");
                        }
                        if (its % EXCEPTIONAL_SHIFT_EVERY == 0 && its > 0) {
                            // exceptional shift
                            t += x;
                            for (int i = 1; i <= nn; i++) {
                                a[i][i] -= x;
                            }
                            s = Math.abs(a[nn][nn - 1]) + Math.abs(a[nn - 1][nn - 2]);
                            x = EXCEPTIONAL_SHIFT * s;
                            y = x;
                            w = EXCEPTIONAL_SHIFT_PRODUCT * s * s;
                        }
                        ++its;
                        int m;
                        for (m = nn - 2; m >= l; m--) {
                            z = a[m][m];
                            r = x - z;
                            s = y - z;
                            p = (r * s - w) / a[m + 1][m] + a[m][m + 1];
                            q = a[m + 1][m + 1] - z - r - s;
                            r = a[m + 2][m + 1];
                            s = Math.abs(p) + Math.abs(q) + Math.abs(r);
                            p /= s;
                            q /= s;
                            r /= s;
                            if (m == l) {
                                break;
                            }
                            double u = Math.abs(a[m][m - 1]) * (Math.abs(q) + Math.abs(r));
                            double v = Math.abs(p) * (Math.abs(a[m - 1][m - 1]) + Math.abs(z)
                                    + Math.abs(a[m + 1][m + 1]));
                            if (u + v == v) {
                                break;
                            }
                        }
                        for (int i = m + 2; i <= nn; i++) {
                            a[i][i - 2] = 0.0;
                            if (i != m + 2) {
                                a[i][i - 3] = 0.0;
                            }
                        }
                        for (int k = m; k <= nn - 1; k++) {
                            if (k != m) {
                                p = a[k][k - 1];
                                q = a[k + 1][k - 1];
                                r = 0.0;
                                if (k != nn - 1) {
                                    r = a[k + 2][k - 1];
                                }
                                x = Math.abs(p) + Math.abs(q) + Math.abs(r);
                                if (x != 0.0) {
                                    p /= x;
                                    q /= x;
                                    r /= x;
                                }
                            }
                            s = Math.copySign(Math.sqrt(p * p + q * q + r * r), p);
                            if (s != 0.0) {
                                if (k == m) {
                                    if (l != m) {
                                        a[k][k - 1] = -a[k][k - 1];
                                    }
                                } else {
                                    a[k][k - 1] = -s * x;
                                }
                                p += s;
                                x = p / s;
                                y = q / s;
                                z = r / s;
                                q /= p;
                                r /= p;
                                for (int j = k; j <= nn; j++) {
                                    p = a[k][j] + q * a[k + 1][j];
                                    if (k != nn - 1) {
                                        p += r * a[k + 2][j];
                                        a[k + 2][j] -= p * z;
                                    }
                                    a[k + 1][j] -= p * y;
                                    a[k][j] -= p * x;
                                }
                                int mmin = Math.min(nn, k + 3);
                                for (int i = l; i <= mmin; i++) {
                                    p = x * a[i][k] + y * a[i][k + 1];
                                    if (k != nn - 1) {
                                        p += z * a[i][k + 2];
                                        a[i][k + 2] -= p * r;
                                    }
                                    a[i][k + 1] -= p * q;
                                    a[i][k] -= p;
                                }
                            }
                        }
                    }
                }
            } while (l < nn - 1);
        }
    }
}
