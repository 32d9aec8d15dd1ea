package breakwater.optimize;

import ai.timefold.solver.core.api.score.BendableScore;
import ai.timefold.solver.core.api.score.calculator.EasyScoreCalculator;

/**
 * Full recompute from the solution, bypassing the memo: the reference the incremental calculator is
 * checked against in assert mode.
 */
public class BankEasyScoreCalculator implements EasyScoreCalculator<BankPlan, BendableScore> {
    @Override
    public BendableScore calculateScore(BankPlan plan) {
        return ScoreLevels.of(plan.getJudges().judgeFresh(plan.countVector()));
    }
}
