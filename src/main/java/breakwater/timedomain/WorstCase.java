package breakwater.timedomain;

/**
 * The exact worst-case transient per ampere of load step ΔI (multiply by ΔI for volts).
 *
 * @param droopOhms        largest sag below the I_min operating point, per ampere of ΔI, &ge; 0
 * @param overshootOhms    largest rise above it, per ampere of ΔI, &ge; 0
 * @param droopPattern     a load pattern that reaches the droop
 * @param overshootPattern a load pattern that reaches the overshoot
 * @param edgeTimeS        the load's edge time t_e used (0 = ideal edges): |du/dt| &le; 1/t_e
 */
public record WorstCase(double droopOhms, double overshootOhms, LoadPattern droopPattern,
                        LoadPattern overshootPattern, double edgeTimeS) {

    public WorstCase {
        new WorstCasePerAmpere(droopOhms, overshootOhms, edgeTimeS); // the same checks of the figures
        java.util.Objects.requireNonNull(droopPattern, "droopPattern");
        java.util.Objects.requireNonNull(overshootPattern, "overshootPattern");
    }

    /** See {@link WorstCasePerAmpere#relativeAccuracy()}. */
    public double relativeAccuracy() {
        return WorstCaseAnalyzer.relativeAccuracy(edgeTimeS);
    }

    /** Bound on the peak-to-peak excursion per ampere: droop + overshoot. */
    public double peakToPeakOhms() {
        return droopOhms + overshootOhms;
    }

    /** The figures alone, without the patterns. */
    public WorstCasePerAmpere figures() {
        return new WorstCasePerAmpere(droopOhms, overshootOhms, edgeTimeS);
    }
}
