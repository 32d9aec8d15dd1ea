package breakwater.optimize;

import ai.timefold.solver.core.api.score.BendableScore;
import ai.timefold.solver.core.api.solver.phase.PhaseCommand;
import ai.timefold.solver.core.api.solver.phase.PhaseCommandContext;
import ai.timefold.solver.core.preview.api.domain.metamodel.PlanningVariableMetaModel;
import ai.timefold.solver.core.preview.api.move.builtin.Moves;

/**
 * Construction phase: from the starting bank, keep adding the part that buys the most reduction of the
 * hard violation per unit of cost, until the bank meets the spec or no single addition helps any more.
 * This is what an engineer does by hand ("what is the cheapest way to take another millivolt off the
 * droop?"); local search then trims and rebalances the result.
 */
public final class GreedyFill implements PhaseCommand<BankPlan> {

    /** How additions are ranked. */
    public enum Rule {
        /** Most hard-violation reduction per unit of added cost: cheap banks, many small parts. */
        PER_COST,
        /** Most hard-violation reduction, whatever it costs: fewer, more effective parts. */
        STEEPEST
    }

    private final Rule rule;

    public GreedyFill(Rule rule) {
        this.rule = rule;
    }

    @Override
    public void changeWorkingSolution(PhaseCommandContext<BankPlan> ctx) {
        @SuppressWarnings("unchecked")
        PlanningVariableMetaModel<BankPlan, PartCount, Integer> var =
                (PlanningVariableMetaModel<BankPlan, PartCount, Integer>) (PlanningVariableMetaModel<?, ?, ?>)
                        ctx.getSolutionMetaModel().genuineEntity(PartCount.class).basicVariable("count");
        BankPlan plan = ctx.getWorkingSolution();
        BendableScore current = score(plan);
        while (!ctx.isPhaseTerminated() && current.hardScore(0) < 0) {
            PartCount bestEntity = null;
            int bestValue = 0;
            double bestRatio = 0;
            BendableScore bestScore = null;
            // with a large catalog only a shortlist (the parts in use and the most promising others) is
            // judged in full per step; a small catalog is tried whole
            PartCount[] byIndex = new PartCount[plan.getCounts().size()];
            int[] maxCounts = new int[byIndex.length];
            for (PartCount pc : plan.getCounts()) {
                byIndex[pc.getIndex()] = pc;
                maxCounts[pc.getIndex()] = pc.getMaxCount();
            }
            for (int index : plan.getJudges().shortlist(plan.countVector(), maxCounts)) {
                PartCount pc = byIndex[index];
                int now = pc.countOrZero();
                if (now >= pc.getMaxCount()) {
                    continue;
                }
                int next = now + 1;
                BendableScore s = ctx.executeTemporarilyAndCalculateScore(Moves.change(var, pc, next));
                long hardGain = s.hardScore(0) - current.hardScore(0);
                if (hardGain <= 0) {
                    continue;
                }
                // soft 0 is −cost in micro-units: the added cost is the drop in soft 0
                double addedCost = Math.max(1, current.softScore(0) - s.softScore(0));
                double ratio = rule == Rule.PER_COST ? hardGain / addedCost : hardGain - 1e-9 * addedCost;
                if (ratio > bestRatio) {
                    bestRatio = ratio;
                    bestEntity = pc;
                    bestValue = next;
                    bestScore = s;
                }
                if (ctx.isPhaseTerminated()) {
                    break;
                }
            }
            if (bestEntity == null) {
                break;
            }
            ctx.execute(Moves.change(var, bestEntity, bestValue));
            current = bestScore;
        }
    }

    private static BendableScore score(BankPlan plan) {
        return ScoreLevels.of(plan.getJudges().judge(plan.countVector()));
    }
}
