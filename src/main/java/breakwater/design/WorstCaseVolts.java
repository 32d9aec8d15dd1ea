package breakwater.design;

import breakwater.scenario.Rail;

/**
 * The exact worst case of a bank in volts, against the rail's tolerance band (docs/worst-case.md#notation):
 * V_min = V_nom − Z(0)·I_min − droop, V_max = V_nom − Z(0)·I_min + overshoot; the bank passes when
 * both stay inside V_nom·(1 ± tolerance).
 *
 * @param droopV       worst droop below the I_min operating point, ΔI·(∫h⁺ dt + max(D, 0)) or the
 *                     slew-limited optimum
 * @param overshootV   worst overshoot above it
 * @param operatingV   the I_min operating point, V_nom − Z(0)·I_min
 * @param minVoltageV  V_min
 * @param maxVoltageV  V_max
 * @param lowerLimitV  V_nom·(1 − tolerance)
 * @param upperLimitV  V_nom·(1 + tolerance)
 * @param worstCaseRatio worst excursion (larger of droop and overshoot) / (ΔI·Z_t): how far the
 *                     target-impedance promise is off; 1 for an impedance flat at the target
 */
public record WorstCaseVolts(double droopV, double overshootV, double operatingV, double minVoltageV,
                               double maxVoltageV, double lowerLimitV, double upperLimitV, double worstCaseRatio) {

    /** Figures against the rail's own tolerance band. */
    public static WorstCaseVolts of(Rail rail, double dcResistanceOhms, double droopOhms, double overshootOhms) {
        return of(rail, dcResistanceOhms, droopOhms, overshootOhms, rail.lowerLimitV(), rail.upperLimitV());
    }

    /** Figures against the given limits (the rail's band, or a tighter one; see {@link Limits}). */
    public static WorstCaseVolts of(Rail rail, double dcResistanceOhms, double droopOhms, double overshootOhms,
                                      double lowerLimitV, double upperLimitV) {
        double dI = rail.currentStepA();
        double droop = dI * droopOhms;
        double over = dI * overshootOhms;
        double op = rail.voltageV() - dcResistanceOhms * rail.minCurrentA();
        double promise = dI * rail.targetImpedanceOhms();
        return new WorstCaseVolts(droop, over, op, op - droop, op + over, lowerLimitV, upperLimitV,
                Math.max(droop, over) / promise);
    }

    /** How far V_min falls below the lower limit (0 when inside). */
    public double droopExcessV() {
        return Math.max(0, lowerLimitV - minVoltageV);
    }

    /** How far V_max rises above the upper limit (0 when inside). */
    public double overshootExcessV() {
        return Math.max(0, maxVoltageV - upperLimitV);
    }

    /** V_min and V_max both inside the limits ({@link Verdict#insideBand}). */
    public boolean passes() {
        return Verdict.insideBand(droopExcessV(), overshootExcessV());
    }

    /** Smallest distance to either limit; negative when a limit is crossed. */
    public double marginV() {
        return Math.min(minVoltageV - lowerLimitV, upperLimitV - maxVoltageV);
    }
}
