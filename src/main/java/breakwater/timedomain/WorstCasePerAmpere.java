package breakwater.timedomain;

/**
 * The exact worst-case figures per ampere of load step ΔI, without the load patterns that reach them:
 * what a search needs to score a candidate. Equal to the droop and overshoot of the {@link WorstCase}
 * that {@link WorstCaseAnalyzer#analyze} returns for the same model and edge time.
 *
 * @param droopOhms     largest sag below the I_min operating point, per ampere of ΔI, &ge; 0
 * @param overshootOhms largest rise above it, per ampere of ΔI, &ge; 0
 * @param edgeTimeS     the load's edge time t_e used (0 = ideal edges): |du/dt| &le; 1/t_e
 */
public record WorstCasePerAmpere(double droopOhms, double overshootOhms, double edgeTimeS) {

    public WorstCasePerAmpere {
        if (!(droopOhms >= 0) || !Double.isFinite(droopOhms) || !(overshootOhms >= 0)
                || !Double.isFinite(overshootOhms)) {
            throw new IllegalArgumentException("worst-case droop and overshoot must be finite and >= 0, got "
                    + droopOhms + ", " + overshootOhms);
        }
        if (!(edgeTimeS >= 0) || !Double.isFinite(edgeTimeS)) {
            throw new IllegalArgumentException("edge time must be finite and >= 0, got " + edgeTimeS);
        }
    }

    /**
     * How far below the model's true worst case these figures may be, relative
     * ({@link WorstCaseAnalyzer#relativeAccuracy}): they are reached by a pattern, so they are never above it.
     */
    public double relativeAccuracy() {
        return WorstCaseAnalyzer.relativeAccuracy(edgeTimeS);
    }

    /** Bound on the peak-to-peak excursion per ampere: droop + overshoot. */
    public double peakToPeakOhms() {
        return droopOhms + overshootOhms;
    }
}
