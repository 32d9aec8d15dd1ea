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
 *   <li><b>drop</b>: remove one type altogether (saves its BOM line);</li>
 *   <li><b>replace by a neighbouring value</b>: move every part of one type to the next capacitance up or
 *       down in the same case, or to the same capacitance in the next case size;</li>
 *   <li><b>transfer</b>: one part more of one type, one fewer of another — a step along the edge of the
 *       feasible region, where the cheapest banks lie and single changes would cross into violation;</li>
 *   <li><b>relocate</b> (with placement regions): every part of one type moved to another region, as many
 *       as fit there.</li>
 * </ul>
 * With a large catalog (more than {@link JudgePool#SHORTLIST_ABOVE} candidates) a part not in use enters
 * only from the shortlist of promising ones ({@link JudgePool#shortlist}), and a type in use may be
 * replaced outright by one of them (<b>replace by a promising part</b>): the moves per step then grow with
 * the parts in use, not with the catalog, and the distinct-part limit is not a wall.
 * The list is rebuilt every step from the current counts (see {@link BankSearch}), so every move changes
 * something.
 */
public final class CountMoves implements MoveListFactory<BankPlan> {

    @Override
    public List<? extends Move<BankPlan>> createMoveList(BankPlan plan) {
        // Built afresh each step (cache type STEP) from the current counts, so that no move is a no-op:
        // an accepted no-op would end a local-search step without changing anything.
        List<Move<BankPlan>> moves = new ArrayList<>();
        List<PartCount> all = plan.getCounts();
        // with a large catalog, parts not in use enter only from the shortlist of promising ones, so the
        // moves per step grow with the parts in use, not with the catalog
        boolean narrow = plan.getJudges().shortlists();
        boolean[] promising = new boolean[all.size()];
        if (narrow) {
            int[] max = new int[all.size()];
            for (PartCount pc : all) {
                max[pc.getIndex()] = pc.getMaxCount();
            }
            for (int i : plan.getJudges().shortlist(plan.countVector(), max)) {
                promising[i] = true;
            }
        } else {
            java.util.Arrays.fill(promising, true);
        }
        for (PartCount pc : all) {
            int now = pc.countOrZero();
            if (now == 0 && !promising[pc.getIndex()]) {
                continue;
            }
            for (int delta : new int[] {1, -1, 3, -3}) {
                int next = Math.max(0, Math.min(pc.getMaxCount(), now + delta));
                if (next != now && (delta > 0 || Math.abs(delta) == 1 || next != 0 || now > 3)) {
                    moves.add(new SetCounts(List.of(pc), new int[] {next}, "nudge"));
                }
            }
            if (now > 1) {
                moves.add(new SetCounts(List.of(pc), new int[] {0}, "drop"));
            }
        }
        for (PartCount a : all) {
            int na = a.countOrZero();
            if (na == 0) {
                continue;
            }
            for (PartCount b : neighbours(a, all)) {
                int nb = b.countOrZero();
                int moved = Math.min(na, b.getMaxCount() - nb);
                if (moved > 0) {
                    moves.add(new SetCounts(List.of(a, b), new int[] {na - moved, nb + moved}, "replace-by-neighbour"));
                }
            }
            for (PartCount b : all) {
                int nb = b.countOrZero();
                if (nb == 0 && !promising[b.getIndex()]) {
                    continue;
                }
                if (narrow && nb == 0 && a != b) {
                    // a type in use replaced by a promising new one, all its parts (or as many as fit)
                    int moved = Math.min(na, b.getMaxCount());
                    if (moved > 0) {
                        moves.add(new SetCounts(List.of(a, b), new int[] {na - moved, moved}, "replace-by-promising"));
                    }
                }
                if (a != b && nb < b.getMaxCount()) {
                    moves.add(new SetCounts(List.of(a, b), new int[] {na - 1, nb + 1}, "transfer"));
                }
                // with placement regions: the same part moved to another region, all of it (or as many as fit)
                if (a != b && !a.getRegion().equals(b.getRegion()) && a.getPart().name().equals(b.getPart().name())) {
                    int moved = Math.min(na, b.getMaxCount() - nb);
                    if (moved > 1) {
                        moves.add(new SetCounts(List.of(a, b), new int[] {na - moved, nb + moved}, "relocate"));
                    }
                }
            }
        }
        return moves;
    }

    /**
     * Next capacitance up and down in the same case; same capacitance (±10 %) in other case sizes; both in
     * the same placement region.
     */
    static List<PartCount> neighbours(PartCount a, List<PartCount> all) {
        List<PartCount> out = new ArrayList<>();
        Part pa = a.getPart();
        List<PartCount> sameCase = all.stream().filter(o -> o != a && o.getRegion().equals(a.getRegion())
                        && o.getPart().caseCode().equals(pa.caseCode()))
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
            if (o != a && o.getRegion().equals(a.getRegion()) && !o.getPart().caseCode().equals(pa.caseCode())
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

    /** Sets the counts of one or two types to values fixed when the move was built for this step. */
    record SetCounts(List<PartCount> targets, int[] values, String kind) implements Move<BankPlan> {
        @Override
        public void execute(MutableSolutionView<BankPlan> view) {
            var var = countVariable(view);
            for (int i = 0; i < targets.size(); i++) {
                view.changeVariable(var, targets.get(i), values[i]);
            }
        }

        @Override
        public SequencedCollection<Object> getPlanningEntities() {
            return List.copyOf(targets);
        }

        @Override
        public SequencedCollection<Object> getPlanningValues() {
            List<Object> v = new ArrayList<>();
            for (int x : values) {
                v.add(x);
            }
            return v;
        }

        @Override
        public String describe() {
            return kind;
        }

        @Override
        public String toString() {
            StringBuilder b = new StringBuilder(kind).append('[');
            for (int i = 0; i < targets.size(); i++) {
                b.append(i == 0 ? "" : ", ").append(targets.get(i).getPart().name())
                        .append(targets.get(i).getRegion().isEmpty() ? "" : "@" + targets.get(i).getRegion()).append("→").append(values[i]);
            }
            return b.append(']').toString();
        }
    }
}
