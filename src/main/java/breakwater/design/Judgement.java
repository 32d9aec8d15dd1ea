package breakwater.design;

/**
 * The solver's view of one candidate bank: every number its score is built from, computed by
 * {@link CandidateJudge} with the same physics as {@link BankEvaluator#evaluate}.
 *
 * @param droopV            worst droop below the I_min operating point, V (exact worst case)
 * @param overshootV        worst overshoot, V
 * @param droopExcessV      how far the worst-case minimum voltage falls below the lower limit, V (0 if inside)
 * @param overshootExcessV  how far the worst-case maximum voltage rises above the upper limit, V (0 if inside)
 * @param boardExcess       parts (or distinct types) beyond the board limits, summed over limits
 * @param targetExcess      max over the band of |Z|/Z_t − 1, or 0 when under target (only when required)
 * @param costTotal         cost per board
 * @param flatnessDb        20·log10(max/min |Z|) in the band, on the solver grid
 * @param peakOverTarget    peak |Z| / Z_t in the band, on the solver grid
 * @param totalParts        parts placed
 */
public record Judgement(double droopV, double overshootV, double droopExcessV, double overshootExcessV,
                        int boardExcess, double targetExcess, double costTotal, double flatnessDb,
                        double peakOverTarget, int totalParts) {

    /** Meets the spec by {@link Verdict#meetsSpec(double, double, int, boolean)}, the rule the full verdict uses. */
    public boolean feasible() {
        return Verdict.meetsSpec(droopExcessV, overshootExcessV, boardExcess, !(targetExcess <= 0));
    }
}
