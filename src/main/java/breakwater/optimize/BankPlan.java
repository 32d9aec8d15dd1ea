package breakwater.optimize;

import ai.timefold.solver.core.api.domain.solution.PlanningEntityCollectionProperty;
import ai.timefold.solver.core.api.domain.solution.PlanningScore;
import ai.timefold.solver.core.api.domain.solution.PlanningSolution;
import ai.timefold.solver.core.api.domain.solution.ProblemFactProperty;
import ai.timefold.solver.core.api.score.BendableScore;

import java.util.List;

/**
 * Planning solution: one {@link PartCount} per candidate part, and the judge that scores them.
 *
 * <p>Score levels (BendableScore, 1 hard, 3 soft), compared in this order:
 * hard = −(worst-case excursion beyond the tolerance in µV + board-limit excess + required-target
 * excess); soft 0 = −cost in micro-units; soft 1 = −flatness in milli-dB; soft 2 = −parts.
 * See {@link ScoreLevels}.
 */
@PlanningSolution
public class BankPlan {
    @ProblemFactProperty
    private JudgePool judges;
    @PlanningEntityCollectionProperty
    private List<PartCount> counts;
    @PlanningScore(bendableHardLevelsSize = 1, bendableSoftLevelsSize = 3)
    private BendableScore score;

    public BankPlan() {
    }

    BankPlan(JudgePool judges, List<PartCount> counts) {
        this.judges = judges;
        this.counts = counts;
    }

    public JudgePool getJudges() {
        return judges;
    }

    public void setJudges(JudgePool judges) {
        this.judges = judges;
    }

    public List<PartCount> getCounts() {
        return counts;
    }

    public void setCounts(List<PartCount> counts) {
        this.counts = counts;
    }

    public BendableScore getScore() {
        return score;
    }

    public void setScore(BendableScore score) {
        this.score = score;
    }

    int[] countVector() {
        int[] c = new int[counts.size()];
        for (PartCount pc : counts) {
            c[pc.getIndex()] = pc.countOrZero();
        }
        return c;
    }
}
