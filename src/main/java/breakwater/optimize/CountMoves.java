package breakwater.optimize;

import ai.timefold.solver.core.impl.heuristic.selector.move.factory.MoveListFactory;
import ai.timefold.solver.core.preview.api.domain.metamodel.PlanningVariableMetaModel;
import ai.timefold.solver.core.preview.api.move.Move;
import ai.timefold.solver.core.preview.api.move.MutableSolutionView;
import breakwater.catalog.Part;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.SequencedCollection;

/**
 * Moves that an engineer would make by hand, besides the solver's own change and swap moves:
 * <ul>
 *   <li><b>nudge</b>: one part type's count up or down by 1 or 3 (the solver's change move jumps to any
 *       value in 0..max, which rarely lands next to a good bank);</li>
 *   <li><b>replace by a neighbouring value</b>: move every part of one type to the next capacitance up or
 *       down in the same case, or to the same capacitance in the next case size.</li>
 * </ul>
 * Moves read the current counts when they run, so a list built once per phase stays valid.
 */
public final class CountMoves implements MoveListFactory<BankPlan> {

    @Override
    public List<? extends Move<BankPlan>> createMoveList(BankPlan plan) {
        List<Move<BankPlan>> moves = new ArrayList<>();
        List<PartCount> all = plan.getCounts();
        for (PartCount pc : all) {
            for (int delta : new int[] {1, -1, 3, -3}) {
                moves.add(new Nudge(pc, delta));
            }
        }
        for (PartCount a : all) {
            for (PartCount b : neighbours(a, all)) {
                moves.add(new Replace(a, b));
            }
        }
        return moves;
    }

    /** Next capacitance up and down in the same case; same capacitance (±10 %) in other case sizes. */
    static List<PartCount> neighbours(PartCount a, List<PartCount> all) {
        List<PartCount> out = new ArrayList<>();
        Part pa = a.getPart();
        List<PartCount> sameCase = all.stream().filter(o -> o != a && o.getPart().caseCode().equals(pa.caseCode()))
                .sorted(Comparator.comparingDouble(o -> o.getPart().capacitanceF())).toList();
        PartCount below = null;
        PartCount above = null;
        for (PartCount o : sameCase) {
            double c = o.getPart().capacitanceF();
            if (c < pa.capacitanceF()) {
                below = o;
            } else if (c > pa.capacitanceF() && above == null) {
                above = o;
            }
        }
        if (below != null) {
            out.add(below);
        }
        if (above != null) {
            out.add(above);
        }
        for (PartCount o : all) {
            if (o != a && !o.getPart().caseCode().equals(pa.caseCode())
                    && Math.abs(o.getPart().capacitanceF() / pa.capacitanceF() - 1) <= 0.1) {
                out.add(o);
            }
        }
        return out;
    }

    @SuppressWarnings("unchecked")
    private static PlanningVariableMetaModel<BankPlan, PartCount, Integer> countVariable(
            MutableSolutionView<BankPlan> view) {
        return (PlanningVariableMetaModel<BankPlan, PartCount, Integer>) (PlanningVariableMetaModel<?, ?, ?>)
                view.getSolutionMetaModel().genuineEntity(PartCount.class).basicVariable("count");
    }

    private static int current(MutableSolutionView<BankPlan> view,
                               PlanningVariableMetaModel<BankPlan, PartCount, Integer> var, PartCount pc) {
        Integer v = view.getValue(var, pc);
        return v == null ? 0 : v;
    }

    /** One type's count changed by a fixed step, clamped to its range. */
    record Nudge(PartCount target, int delta) implements Move<BankPlan> {
        @Override
        public void execute(MutableSolutionView<BankPlan> view) {
            var var = countVariable(view);
            int now = current(view, var, target);
            int next = Math.max(0, Math.min(target.getMaxCount(), now + delta));
            if (next != now) {
                view.changeVariable(var, target, next);
            }
        }

        @Override
        public SequencedCollection<Object> getPlanningEntities() {
            return List.of(target);
        }

        @Override
        public String describe() {
            return "nudge";
        }
    }

    /** Every part of type {@code from} replaced by type {@code to} (as far as {@code to}'s range allows). */
    record Replace(PartCount from, PartCount to) implements Move<BankPlan> {
        @Override
        public void execute(MutableSolutionView<BankPlan> view) {
            var var = countVariable(view);
            int a = current(view, var, from);
            if (a == 0) {
                return;
            }
            int b = current(view, var, to);
            int moved = Math.min(a, to.getMaxCount() - b);
            if (moved <= 0) {
                return;
            }
            view.changeVariable(var, from, a - moved);
            view.changeVariable(var, to, b + moved);
        }

        @Override
        public SequencedCollection<Object> getPlanningEntities() {
            return List.of(from, to);
        }

        @Override
        public String describe() {
            return "replace-by-neighbour";
        }
    }
}
