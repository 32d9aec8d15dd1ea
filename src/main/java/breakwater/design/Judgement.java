package breakwater.design;

/**
 * The solver's view of one candidate bank: every number its score is built from, computed by
 * {@link CandidateJudge} with the same physics as {@link BankEvaluator#evaluate}.
 *
 * @param droopV            worst droop below the I_min operating point, V: the exact worst case, or an upper
 *                          bound of it when {@code figuresExact} is false
 * @param overshootV        worst overshoot, V (exact, or an upper bound when {@code figuresExact} is false)
 * @param droopExcessV      how far the worst-case minimum voltage falls below the lower limit, V (0 if inside)
 * @param overshootExcessV  how far the worst-case maximum voltage rises above the upper limit, V (0 if inside)
 * @param boardExcess       parts (or distinct types) beyond the board limits, summed over limits
 * @param targetExcess      max over the band of |Z|/Z_t − 1, or 0 when under target (only when required)
 * @param costTotal         cost per board
 * @param flatnessDb        20·log10(max/min |Z|) in the band, on the solver grid
 * @param peakOverTarget    peak |Z| / Z_t in the band, on the solver grid
 * @param totalParts        parts placed
 * @param figuresExact      whether droopV and overshootV are the exact worst case; false when a bound
 *                          settled the bank as passing (docs/search.md#bounds-in-the-judge): both excesses
 *                          are then 0, as they are exactly, but the two figures are upper bounds and must
 *                          not be shown as the worst case
 */
public record Judgement(double droopV, double overshootV, double droopExcessV, double overshootExcessV,
                        int boardExcess, double targetExcess, double costTotal, double flatnessDb,
                        double peakOverTarget, int totalParts, boolean figuresExact) {

    public Judgement {
        if (!figuresExact && (droopExcessV != 0 || overshootExcessV != 0)) {
            throw new IllegalArgumentException("bounded figures are for passing banks only, got excesses "
                    + droopExcessV + ", " + overshootExcessV);
        }
    }

    /** A judgement with the exact worst case. */
    public Judgement(double droopV, double overshootV, double droopExcessV, double overshootExcessV,
                     int boardExcess, double targetExcess, double costTotal, double flatnessDb,
                     double peakOverTarget, int totalParts) {
        this(droopV, overshootV, droopExcessV, overshootExcessV, boardExcess, targetExcess, costTotal, flatnessDb,
                peakOverTarget, totalParts, true);
    }

    /** Meets the spec by {@link Verdict#meetsSpec(double, double, int, boolean)}, the rule the full verdict uses. */
    public boolean feasible() {
        return Verdict.meetsSpec(droopExcessV, overshootExcessV, boardExcess, !(targetExcess <= 0));
    }
}
