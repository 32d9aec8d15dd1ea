package breakwater.scenario;

import java.util.Objects;

/**
 * The rail's electrical specification.
 *
 * @param name              free text for reports
 * @param voltageV          nominal voltage, &gt; 0
 * @param toleranceFraction allowed deviation either side of nominal (0.03 = ±3 %), in (0, 1)
 * @param maxCurrentA       largest load current, &gt; 0
 * @param currentStepA      ΔI = I_max − I_min, in (0, I_max]
 * @param edgeTimeS         shortest time the load takes to swing by ΔI; 0 for ideal edges
 */
public record Rail(String name, double voltageV, double toleranceFraction, double maxCurrentA,
                   double currentStepA, double edgeTimeS) {

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
    }

    /** I_min = I_max − ΔI. */
    public double minCurrentA() {
        return Math.max(0.0, maxCurrentA - currentStepA);
    }

    /**
     * Target impedance Z_t = V_nom × tolerance / ΔI (common practice; docs/network-model.md#target-impedance).
     * A guide, not a guarantee.
     */
    public double targetImpedanceOhms() {
        return voltageV * toleranceFraction / currentStepA;
    }

    /** Lowest allowed voltage, V_nom·(1 − tolerance). */
    public double lowerLimitV() {
        return voltageV * (1 - toleranceFraction);
    }

    /** Highest allowed voltage, V_nom·(1 + tolerance). */
    public double upperLimitV() {
        return voltageV * (1 + toleranceFraction);
    }

    public boolean hasEdgeTime() {
        return edgeTimeS > 0;
    }
}
