package breakwater.scenario;

import java.util.Objects;

/**
 * The rail's electrical specification, with its tolerance budget: the regulator's set-point accuracy and
 * its output ripple take their share of the tolerance, and the load transient gets what is left
 * (common practice; docs/network-model.md#target-impedance). Either side of nominal the transient may use
 * tolerance − set point − ripple/2 (the ripple is peak-to-peak, half of it on each side), and that is the
 * band {@link #lowerLimitV()} .. {@link #upperLimitV()} the worst case must stay inside.
 *
 * @param name              free text for reports
 * @param voltageV          nominal voltage, &gt; 0
 * @param toleranceFraction allowed deviation either side of nominal (0.03 = ±3 %), in (0, 1)
 * @param maxCurrentA       largest load current, &gt; 0
 * @param currentStepA      ΔI = I_max − I_min, in (0, I_max]
 * @param edgeTimeS         shortest time the load takes to swing by ΔI; 0 for ideal edges
 * @param setPointFraction  the regulator's set-point accuracy either side of nominal (0.01 = ±1 %), &ge; 0
 * @param rippleVpp         the regulator's output ripple, volts peak-to-peak, &ge; 0
 */
public record Rail(String name, double voltageV, double toleranceFraction, double maxCurrentA,
                   double currentStepA, double edgeTimeS, double setPointFraction, double rippleVpp) {

    public Rail {
        Objects.requireNonNull(name, "name");
        if (!(voltageV > 0)) {
            throw new IllegalArgumentException("rail voltage must be > 0");
        }
        if (!(toleranceFraction > 0 && toleranceFraction < 1)) {
            throw new IllegalArgumentException("rail tolerance must be in (0, 100 %)");
        }
        if (!(maxCurrentA > 0)) {
            throw new IllegalArgumentException("max current must be > 0");
        }
        if (!(currentStepA > 0 && currentStepA <= maxCurrentA * (1 + 1e-12))) {
            throw new IllegalArgumentException("current step must be in (0, max current]");
        }
        if (!(edgeTimeS >= 0) || !Double.isFinite(edgeTimeS)) {
            throw new IllegalArgumentException("edge time must be >= 0");
        }
        if (!(setPointFraction >= 0 && setPointFraction < 1)) {
            throw new IllegalArgumentException("set-point accuracy must be in [0, 100 %)");
        }
        if (!(rippleVpp >= 0) || !Double.isFinite(rippleVpp)) {
            throw new IllegalArgumentException("ripple must be finite and >= 0 V");
        }
        if (!leavesRoom(voltageV, toleranceFraction, setPointFraction, rippleVpp)) {
            throw new IllegalArgumentException("set-point accuracy and ripple leave nothing of the tolerance "
                    + "for the load transient");
        }
    }

    /**
     * Whether set point and ripple leave the transient a share of the tolerance: more than 1e-9 of it, so
     * that allowances that add up to the whole tolerance, but round to a hair less, count as leaving nothing.
     */
    static boolean leavesRoom(double voltageV, double toleranceFraction, double setPointFraction, double rippleVpp) {
        return toleranceFraction - setPointFraction - rippleVpp / (2 * voltageV) > 1e-9 * toleranceFraction;
    }

    /** A rail whose whole tolerance is left for the transient (no set-point or ripple allowance). */
    public Rail(String name, double voltageV, double toleranceFraction, double maxCurrentA,
                double currentStepA, double edgeTimeS) {
        this(name, voltageV, toleranceFraction, maxCurrentA, currentStepA, edgeTimeS, 0, 0);
    }

    /** I_min = I_max − ΔI. */
    public double minCurrentA() {
        return Math.max(0.0, maxCurrentA - currentStepA);
    }

    /** The set-point allowance either side of nominal, V_nom × set-point accuracy. */
    public double setPointV() {
        return voltageV * setPointFraction;
    }

    /**
     * What is left of the tolerance for the load transient either side of nominal, in volts:
     * V_nom × tolerance − V_nom × set point − ripple/2.
     */
    public double transientAllowanceV() {
        return voltageV * toleranceFraction - setPointV() - rippleVpp / 2;
    }

    /** {@link #transientAllowanceV()} as a fraction of V_nom. */
    public double transientFraction() {
        return transientAllowanceV() / voltageV;
    }

    /** Whether a set-point accuracy or a ripple takes a share of the tolerance. */
    public boolean hasBudget() {
        return setPointFraction > 0 || rippleVpp > 0;
    }

    /**
     * Target impedance from what is left for the transient, Z_t = V_nom × (tolerance − set point −
     * ripple/(2 V_nom)) / ΔI (common practice; docs/network-model.md#target-impedance): V_nom × tolerance /
     * ΔI without a budget. A guide, not a guarantee.
     */
    public double targetImpedanceOhms() {
        return transientAllowanceV() / currentStepA;
    }

    /** Lowest voltage the transient may reach: V_nom − {@link #transientAllowanceV()} (V_nom·(1 − tolerance) without a budget). */
    public double lowerLimitV() {
        return hasBudget() ? voltageV - transientAllowanceV() : toleranceLowerV();
    }

    /** Highest voltage the transient may reach: V_nom + {@link #transientAllowanceV()}. */
    public double upperLimitV() {
        return hasBudget() ? voltageV + transientAllowanceV() : toleranceUpperV();
    }

    /** The rail's whole tolerance band, V_nom·(1 − tolerance). */
    public double toleranceLowerV() {
        return voltageV * (1 - toleranceFraction);
    }

    /** The rail's whole tolerance band, V_nom·(1 + tolerance). */
    public double toleranceUpperV() {
        return voltageV * (1 + toleranceFraction);
    }

    public boolean hasEdgeTime() {
        return edgeTimeS > 0;
    }
}
