package breakwater.optimize;

import ai.timefold.solver.core.api.score.BendableScore;
import ai.timefold.solver.core.api.score.calculator.IncrementalScoreCalculator;

/**
 * Incremental score: keeps only the integer counts as state (drift-free) and judges the whole bank in
 * {@link #calculateScore()} through the shared {@link JudgePool}. A count not yet assigned reads as 0.
 */
public class BankScoreCalculator implements IncrementalScoreCalculator<BankPlan, BendableScore> {
    private JudgePool judges;
    private int[] counts;

    public BankScoreCalculator() {
    }

    @Override
    public void resetWorkingSolution(BankPlan plan) {
        judges = plan.getJudges();
        counts = plan.countVector();
    }

    @Override
    public void beforeVariableChanged(Object entity, String variableName) {
        // the new value is read in afterVariableChanged; nothing to undo here
    }

    @Override
    public void afterVariableChanged(Object entity, String variableName) {
        PartCount pc = (PartCount) entity;
        counts[pc.getIndex()] = pc.countOrZero();
    }

    @Override
    public BendableScore calculateScore() {
        return ScoreLevels.of(judges.judge(counts));
    }
}
