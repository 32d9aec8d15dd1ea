package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;

import java.util.List;

/**
 * The network (docs/network-model.md#the-lumped-network) flattened into primitive arrays, with the admittance Y(s) seen from the
 * load node and its derivative Y'(s) at any complex s, in closed form:
 * <ul>
 * <li>shunt branch R + sL + 1/(sC): y = sC/d, d = 1 + sRC + s²LC, y' = C(1 − s²LC)/d²;</li>
 * <li>regulator R + sL: y = 1/q, q = R + sL, y' = −L/q²;</li>
 * <li>package path R_p + sL_p in series with the board node (admittance Y_b):
 *     y = Y_b/(1 + Y_b·Q), Q = R_p + sL_p, y' = (Y_b' − Y_b²·L_p)/(1 + Y_b·Q)²
 *     (well defined also where Y_b = 0).</li>
 * <li>each placement region behind its spreading path R_r + sL_r (docs/network-model.md#placement-regions),
 *     in the same form with the region node's admittance Y_r in place of Y_b; added at the board node.</li>
 * </ul>
 * Complex numbers are pairs of doubles; nothing is allocated per evaluation.
 */
final class Ladder {

    final double regR;
    final double regL;
    final boolean pkg;
    final double pkgR;
    final double pkgL;
    final double[] bR;
    final double[] bL;
    final double[] bC;
    final double[] lR;
    final double[] lL;
    final double[] lC;
    /** Spreading paths of the regions behind one (short paths are folded into the board node). */
    final double[] rR;
    final double[] rL;
    /** Region k's branches are rbR/rbL/rbC[rStart[k] … rStart[k+1]). */
    final int[] rStart;
    final double[] rbR;
    final double[] rbL;
    final double[] rbC;

    // results of the last eval(): Y, Y', and the scale Σ(|Re y_i| + |Im y_i|) of the terms summed at the load node
    double yr;
    double yi;
    double dr;
    double di;
    double scale;
    private final double[] acc = new double[5];

    Ladder(PowerNetwork n) {
        regR = n.regulatorResistanceOhms();
        regL = n.regulatorInductanceH();
        pkg = n.hasPackage();
        pkgR = n.packageResistanceOhms();
        pkgL = n.packageInductanceH();
        List<SeriesBranch> b = n.boardNodeBranches();
        bR = new double[b.size()];
        bL = new double[b.size()];
        bC = new double[b.size()];
        for (int k = 0; k < b.size(); k++) {
            bR[k] = b.get(k).resistanceOhms();
            bL[k] = b.get(k).inductanceH();
            bC[k] = b.get(k).capacitanceF();
        }
        List<SeriesBranch> l = n.loadBranches();
        lR = new double[l.size()];
        lL = new double[l.size()];
        lC = new double[l.size()];
        for (int k = 0; k < l.size(); k++) {
            lR[k] = l.get(k).resistanceOhms();
            lL[k] = l.get(k).inductanceH();
            lC[k] = l.get(k).capacitanceF();
        }
        List<breakwater.network.RegionPath> regions = n.spreadRegions();
        rR = new double[regions.size()];
        rL = new double[regions.size()];
        rStart = new int[regions.size() + 1];
        int total = 0;
        for (int k = 0; k < regions.size(); k++) {
            rR[k] = regions.get(k).resistanceOhms();
            rL[k] = regions.get(k).inductanceH();
            rStart[k] = total;
            total += regions.get(k).branches().size();
        }
        rStart[regions.size()] = total;
        rbR = new double[total];
        rbL = new double[total];
        rbC = new double[total];
        int j = 0;
        for (breakwater.network.RegionPath r : regions) {
            for (SeriesBranch x : r.branches()) {
                rbR[j] = x.resistanceOhms();
                rbL[j] = x.inductanceH();
                rbC[j] = x.capacitanceF();
                j++;
            }
        }
    }

    /** Evaluates Y(s), Y'(s) and the scale at s = sr + j·si into the fields. */
    void eval(double sr, double si) {
        double s2r = sr * sr - si * si;
        double s2i = 2 * sr * si;
        // regulator
        double qr = regR + regL * sr;
        double qi = regL * si;
        double m = 1.0 / (qr * qr + qi * qi);
        double ybr = qr * m;
        double ybi = -qi * m;
        // y' = -L conj(q)^2 / |q|^4
        double cq2r = qr * qr - qi * qi;
        double cq2i = -2 * qr * qi;
        double dbr = -regL * cq2r * m * m;
        double dbi = -regL * cq2i * m * m;
        double sc = Math.abs(ybr) + Math.abs(ybi);
        acc[0] = ybr;
        acc[1] = ybi;
        acc[2] = dbr;
        acc[3] = dbi;
        acc[4] = sc;
        addBranches(bR, bL, bC, 0, bR.length, sr, si, s2r, s2i, acc);
        for (int k = 0; k < rR.length; k++) {
            addRegion(k, sr, si, s2r, s2i);
        }
        if (!pkg) {
            yr = acc[0];
            yi = acc[1];
            dr = acc[2];
            di = acc[3];
            scale = acc[4];
            return;
        }
        double Ybr = acc[0];
        double Ybi = acc[1];
        double Dbr = acc[2];
        double Dbi = acc[3];
        // den = 1 + Yb * (R + sL)
        double Qr = pkgR + pkgL * sr;
        double Qi = pkgL * si;
        double denr = 1 + Ybr * Qr - Ybi * Qi;
        double deni = Ybr * Qi + Ybi * Qr;
        double md = 1.0 / (denr * denr + deni * deni);
        // y = Yb / den
        double ypr = (Ybr * denr + Ybi * deni) * md;
        double ypi = (Ybi * denr - Ybr * deni) * md;
        // y' = (Yb' - Yb^2 L) / den^2
        double nr = Dbr - pkgL * (Ybr * Ybr - Ybi * Ybi);
        double ni = Dbi - pkgL * (2 * Ybr * Ybi);
        double d2r = denr * denr - deni * deni;
        double d2i = 2 * denr * deni;
        double md2 = md * md;
        double dpr = (nr * d2r + ni * d2i) * md2;
        double dpi = (ni * d2r - nr * d2i) * md2;
        acc[0] = ypr;
        acc[1] = ypi;
        acc[2] = dpr;
        acc[3] = dpi;
        // the path's rounding scale is the board node's (its terms cancel where Y_b = 0), divided by |den|
        acc[4] = acc[4] * Math.sqrt(md);
        addBranches(lR, lL, lC, 0, lR.length, sr, si, s2r, s2i, acc);
        yr = acc[0];
        yi = acc[1];
        dr = acc[2];
        di = acc[3];
        scale = acc[4];
    }

    private final double[] region = new double[5];

    /**
     * Adds region k behind its path Q = R_r + sL_r to the board node's sums in {@code acc}:
     * y = Y_r/(1 + Y_r·Q), y' = (Y_r' − Y_r²·L_r)/(1 + Y_r·Q)², as for the package path.
     */
    private void addRegion(int k, double sr, double si, double s2r, double s2i) {
        double[] g = region;
        java.util.Arrays.fill(g, 0.0);
        addBranches(rbR, rbL, rbC, rStart[k], rStart[k + 1], sr, si, s2r, s2i, g);
        double Yr = g[0];
        double Yi = g[1];
        double Qr = rR[k] + rL[k] * sr;
        double Qi = rL[k] * si;
        double denr = 1 + Yr * Qr - Yi * Qi;
        double deni = Yr * Qi + Yi * Qr;
        double md = 1.0 / (denr * denr + deni * deni);
        double nr = g[2] - rL[k] * (Yr * Yr - Yi * Yi);
        double ni = g[3] - rL[k] * (2 * Yr * Yi);
        double d2r = denr * denr - deni * deni;
        double d2i = 2 * denr * deni;
        double md2 = md * md;
        acc[0] += (Yr * denr + Yi * deni) * md;
        acc[1] += (Yi * denr - Yr * deni) * md;
        acc[2] += (nr * d2r + ni * d2i) * md2;
        acc[3] += (ni * d2r - nr * d2i) * md2;
        acc[4] += g[4] * Math.sqrt(md);
    }

    private static void addBranches(double[] R, double[] L, double[] C, int from, int to, double sr, double si,
                                    double s2r, double s2i, double[] acc) {
        double ar = acc[0];
        double ai = acc[1];
        double br = acc[2];
        double bi = acc[3];
        double sc = acc[4];
        for (int k = from; k < to; k++) {
            double c = C[k];
            double rc = R[k] * c;
            double lc = L[k] * c;
            double dR = 1 + rc * sr + lc * s2r;
            double dI = rc * si + lc * s2i;
            double inv = 1.0 / (dR * dR + dI * dI);
            double nR = c * sr;
            double nI = c * si;
            double yR = (nR * dR + nI * dI) * inv;
            double yI = (nI * dR - nR * dI) * inv;
            double pR = c * (1 - lc * s2r);
            double pI = -c * lc * s2i;
            double d2R = dR * dR - dI * dI;
            double d2I = 2 * dR * dI;
            double inv2 = inv * inv;
            ar += yR;
            ai += yI;
            br += (pR * d2R + pI * d2I) * inv2;
            bi += (pI * d2R - pR * d2I) * inv2;
            sc += Math.abs(yR) + Math.abs(yI);
        }
        acc[0] = ar;
        acc[1] = ai;
        acc[2] = br;
        acc[3] = bi;
        acc[4] = sc;
    }
}
