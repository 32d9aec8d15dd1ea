package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

import java.util.ArrayList;
import java.util.List;

/**
 * An independent time-domain reference: the circuit's state equations written directly from Kirchhoff's
 * laws (states: inductor currents and capacitor voltages only; node voltages from KCL through the
 * inductance-free branches), integrated by Commons Math's Dormand–Prince 8(5,3) integrator.
 * Needs at least one inductance-free branch with R &gt; 0 at each node (plane and die), and inductance in
 * the regulator and package. The load draws u(t) amperes; the output is the voltage drop Z∗u at the load.
 * Placement regions behind a spreading path need inductance in the path and in every branch there: the
 * region node's voltage then follows from the path and branch currents' derivatives summing to zero
 * (KCL differentiated), V_r·(1/L_r + Σ 1/L_k) = (V_b − R_r·i_r)/L_r + Σ (R_k·i_k + v_Ck)/L_k.
 */
final class CircuitOde implements FirstOrderDifferentialEquations {

    private record Br(double r, double l, double c, boolean atLoad) {
    }

    private final PowerNetwork net;
    private final List<Br> branches = new ArrayList<>();
    private final List<breakwater.network.RegionPath> regions;
    private final int regionBase;
    private final int dim;
    // u(t) on the current segment: u0 + slope·(t − t0)
    private double segT0;
    private double segU0;
    private double segSlope;

    CircuitOde(PowerNetwork net) {
        this.net = net;
        if (net.regulatorInductanceH() == 0 || (net.hasPackage() && net.packageInductanceH() == 0)) {
            throw new IllegalArgumentException("reference ODE needs inductance in regulator and package");
        }
        for (SeriesBranch b : net.boardNodeBranches()) {
            branches.add(new Br(b.resistanceOhms(), b.inductanceH(), b.capacitanceF(), !net.hasPackage()));
        }
        for (SeriesBranch b : net.loadBranches()) {
            branches.add(new Br(b.resistanceOhms(), b.inductanceH(), b.capacitanceF(), true));
        }
        int d = 1 + (net.hasPackage() ? 1 : 0);
        for (Br b : branches) {
            d += b.l() > 0 ? 2 : 1;
        }
        regions = net.spreadRegions();
        regionBase = d;
        for (breakwater.network.RegionPath r : regions) {
            if (r.inductanceH() == 0 || r.branches().stream().anyMatch(b -> b.inductanceH() == 0)) {
                throw new IllegalArgumentException("reference ODE needs inductance in each region's path and parts");
            }
            d += 1 + 2 * r.branches().size();
        }
        dim = d;
    }

    @Override
    public int getDimension() {
        return dim;
    }

    private double u(double t) {
        return segU0 + segSlope * (t - segT0);
    }

    /** The two node voltages, V (equal without a package). */
    private record NodeVoltages(double boardV, double loadV) {
    }

    /** Node voltages from the state and the load current. */
    private NodeVoltages nodeVoltages(double[] y, double load) {
        boolean pkg = net.hasPackage();
        double iReg = y[0];
        double iPkg = pkg ? y[1] : 0;
        int idx = pkg ? 2 : 1;
        // KCL at each node: Σ_{L=0} (V − v_C)/R = I_in
        double gB = 0;
        double sB = 0;
        double inB = -iReg + (pkg ? iPkg : -load);
        int at = regionBase;
        for (breakwater.network.RegionPath r : regions) {
            inB -= y[at];
            at += 1 + 2 * r.branches().size();
        }
        double gL = 0;
        double sL = 0;
        double inL = pkg ? -load - iPkg : 0;
        for (Br b : branches) {
            if (b.l() > 0) {
                double i = y[idx];
                if (b.atLoad() && pkg) {
                    inL -= i;
                } else {
                    inB -= i;
                }
                idx += 2;
            } else {
                double vc = y[idx];
                if (b.atLoad() && pkg) {
                    gL += 1 / b.r();
                    sL += vc / b.r();
                } else {
                    gB += 1 / b.r();
                    sB += vc / b.r();
                }
                idx += 1;
            }
        }
        double vb = (inB + sB) / gB;
        double vl = pkg ? (inL + sL) / gL : vb;
        return new NodeVoltages(vb, vl);
    }

    @Override
    public void computeDerivatives(double t, double[] y, double[] yDot) {
        boolean pkg = net.hasPackage();
        // the load draws u: injected current −u; we integrate the network driven by +u injected so that
        // the output voltage equals (Z ∗ u)(t) directly
        NodeVoltages v = nodeVoltages(y, -u(t));
        double vb = v.boardV();
        double vl = v.loadV();
        yDot[0] = (vb - net.regulatorResistanceOhms() * y[0]) / net.regulatorInductanceH();
        if (pkg) {
            yDot[1] = (vl - vb - net.packageResistanceOhms() * y[1]) / net.packageInductanceH();
        }
        int idx = pkg ? 2 : 1;
        for (Br b : branches) {
            double vn = b.atLoad() && pkg ? vl : (b.atLoad() ? vb : vb);
            if (b.atLoad() && pkg) {
                vn = vl;
            }
            if (b.l() > 0) {
                double i = y[idx];
                double vc = y[idx + 1];
                yDot[idx] = (vn - b.r() * i - vc) / b.l();
                yDot[idx + 1] = i / b.c();
                idx += 2;
            } else {
                double vc = y[idx];
                yDot[idx] = (vn - vc) / b.r() / b.c();
                idx += 1;
            }
        }
        for (breakwater.network.RegionPath r : regions) {
            double ip = y[idx];
            double gSum = 1 / r.inductanceH();
            double num = (vb - r.resistanceOhms() * ip) / r.inductanceH();
            int j = idx + 1;
            for (SeriesBranch b : r.branches()) {
                gSum += 1 / b.inductanceH();
                num += (b.resistanceOhms() * y[j] + y[j + 1]) / b.inductanceH();
                j += 2;
            }
            double vr = num / gSum;
            yDot[idx] = (vb - vr - r.resistanceOhms() * ip) / r.inductanceH();
            j = idx + 1;
            for (SeriesBranch b : r.branches()) {
                yDot[j] = (vr - b.resistanceOhms() * y[j] - y[j + 1]) / b.inductanceH();
                yDot[j + 1] = y[j] / b.capacitanceF();
                j += 2;
            }
            idx = j;
        }
    }

    /**
     * Simulates the pattern from rest (u = 0 before the pattern's earliest lag) and returns (Z∗u)(T) at the
     * worst instant T, in volts per ampere.
     */
    double responseAtWorstInstant(LoadPattern p, double relTol) {
        double total = p.lengthS();
        double[] y = new double[dim];
        double[] absTol = new double[dim];
        double[] relTols = new double[dim];
        java.util.Arrays.fill(absTol, 1e-13);
        java.util.Arrays.fill(relTols, relTol);
        DormandPrince853Integrator integ = new DormandPrince853Integrator(1e-18, Math.max(total, 1e-12),
                absTol, relTols);
        double[] lags = p.lagsS();
        double[] vals = p.values();
        // u before the pattern (lag > length) is taken as the last value from rest: start with a segment
        // of zero length; the pattern generated by the analyzer ends where h has decayed.
        for (int i = lags.length - 1; i >= 1; i--) {
            double la = lags[i];
            double lb = lags[i - 1];
            if (la == lb) {
                continue;
            }
            double ta = total - la;
            double tb = total - lb;
            segT0 = ta;
            segU0 = vals[i];
            segSlope = (vals[i - 1] - vals[i]) / (tb - ta);
            integ.integrate(this, ta, y, tb, y);
        }
        segT0 = total;
        segU0 = vals[0];
        segSlope = 0;
        return nodeVoltages(y, -vals[0]).loadV();
    }
}
