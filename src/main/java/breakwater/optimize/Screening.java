package breakwater.optimize;

import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.Candidates;
import breakwater.network.PartBranches;
import breakwater.network.SeriesBranch;
import breakwater.scenario.Board;
import breakwater.scenario.Scenario;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;

/**
 * The candidates a search actually walks: the scenario's candidates less those that provably cannot be
 * in a cheapest passing bank (docs/search.md#screening). Two rules, both exact:
 * <ul>
 *   <li><b>no room</b>: the board, its case limits or the candidate's region leave no place for one part
 *       (its largest count is 0);</li>
 *   <li><b>same as a cheaper part</b>: another candidate in the same region has the same case code and the
 *       same branch under the footprint (ESR, ESL plus mounting inductance, capacitance after DC-bias
 *       retention, all equal) and costs no more, and its own largest count already reaches every limit
 *       the two share. Any bank that uses the dropped part then has a twin that uses the kept one instead:
 *       the same network, the same or fewer distinct parts, no higher cost.</li>
 * </ul>
 * No part is dropped for its impedance alone: the worst case is set at every frequency, not only inside
 * the band, and adding any branch moves the anti-resonances, so "this part cannot help" has no proof.
 *
 * @param kept        the candidates searched, in the scenario's order
 * @param maxCounts   their largest counts, aligned with {@code kept}
 * @param considered  candidates before screening
 * @param dropped     what was left out, and why
 */
public record Screening(Candidates kept, int[] maxCounts, int considered, List<Dropped> dropped) {

    public Screening {
        Objects.requireNonNull(kept);
        maxCounts = maxCounts.clone();
        dropped = List.copyOf(dropped);
    }

    /** Why a candidate was left out. */
    public enum Reason {
        NO_ROOM("no room for its case"),
        SAME_AS_CHEAPER("the same as a part that costs no more");

        private final String words;

        Reason(String words) {
            this.words = words;
        }

        public String words() {
            return words;
        }
    }

    /**
     * A candidate left out.
     *
     * @param part    its part's name
     * @param region  its region ("" on the board node)
     * @param reason  why
     * @param keptAs  for {@link Reason#SAME_AS_CHEAPER}, the part kept in its place; else ""
     */
    public record Dropped(String part, String region, Reason reason, String keptAs) {
    }

    /** Every candidate, nothing dropped (for callers that must search the catalog as given). */
    public static Screening none(Candidates candidates, int[] maxCounts) {
        return new Screening(candidates, maxCounts, candidates.size(), List.of());
    }

    /** Screens the candidates of {@code parts} for the evaluator's scenario and footprint. */
    public static Screening of(BankEvaluator evaluator, List<Part> parts) {
        Candidates all = Candidates.forScenario(parts, evaluator.scenario());
        return of(evaluator, all, MaxCounts.of(all, evaluator.scenario()));
    }

    /** Screens {@code candidates} (largest counts {@code maxCounts}, aligned). */
    public static Screening of(BankEvaluator evaluator, Candidates candidates, int[] maxCounts) {
        Scenario s = evaluator.scenario();
        int n = candidates.size();
        List<Dropped> dropped = new ArrayList<>();
        boolean[] drop = new boolean[n];
        // the kept twin of each electrical identity, per region and case: the cheapest, then the first
        Map<String, Integer> twinOf = new HashMap<>();
        Map<Integer, String> twinKey = new HashMap<>();
        for (int i = 0; i < n; i++) {
            Part p = candidates.part(i);
            if (maxCounts[i] <= 0) {
                drop[i] = true;
                dropped.add(new Dropped(p.name(), candidates.region(i), Reason.NO_ROOM, ""));
                continue;
            }
            String key = identity(candidates.region(i), p, PartBranches.single(p, evaluator.footprint()));
            Integer j = twinOf.get(key);
            if (j == null) {
                twinOf.put(key, i);
                continue;
            }
            // i and j are twins: keep the cheaper (the earlier on a tie), if its count covers the shared limits
            int cheap = candidates.part(i).unitCost() < candidates.part(j).unitCost() ? i : j;
            int dear = cheap == i ? j : i;
            if (maxCounts[cheap] >= sharedLimit(s, candidates, dear)) {
                drop[dear] = true;
                twinKey.put(dear, key);
                twinOf.put(key, cheap);
            }
        }
        // name each dropped twin's kept part once all are known (a cheaper twin may come later)
        for (var e : new java.util.TreeMap<>(twinKey).entrySet()) {
            int dear = e.getKey();
            dropped.add(new Dropped(candidates.part(dear).name(), candidates.region(dear), Reason.SAME_AS_CHEAPER,
                    candidates.part(twinOf.get(e.getValue())).name()));
        }
        if (dropped.isEmpty()) {
            return new Screening(candidates, maxCounts, n, List.of());
        }
        List<Part> ps = new ArrayList<>();
        List<String> rs = new ArrayList<>();
        List<Integer> max = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (!drop[i]) {
                ps.add(candidates.part(i));
                rs.add(candidates.region(i));
                max.add(maxCounts[i]);
            }
        }
        if (ps.isEmpty()) {
            // nothing has room: search the candidates as given, so the search reports the board limits
            return new Screening(candidates, maxCounts, n, List.of());
        }
        return new Screening(Candidates.of(ps, rs), max.stream().mapToInt(Integer::intValue).toArray(), n, dropped);
    }

    /** Region, case and the exact branch values: equal keys, interchangeable parts. */
    private static String identity(String region, Part p, SeriesBranch b) {
        return region + '\u0000' + p.caseCode() + '\u0000' + Double.doubleToLongBits(b.resistanceOhms()) + ':'
                + Double.doubleToLongBits(b.inductanceH()) + ':' + Double.doubleToLongBits(b.capacitanceF());
    }

    /**
     * The most parts of candidate i's case that its place allows, whatever the part: the board's
     * {@code max_parts} and {@code max_per_case}, its region's room (Integer.MAX_VALUE when unlimited).
     */
    static int sharedLimit(Scenario s, Candidates candidates, int i) {
        Part p = candidates.part(i);
        Board board = s.board();
        int limit = Integer.MAX_VALUE;
        Integer perCase = board.maxPerCase().get(p.caseCode());
        if (perCase != null) {
            limit = Math.min(limit, perCase);
        }
        if (board.maxPartsLimit().isPresent()) {
            limit = Math.min(limit, board.maxParts());
        }
        var region = s.region(candidates.region(i));
        if (region.isPresent()) {
            limit = Math.min(limit, Candidates.room(region.get(), p));
        }
        return limit;
    }

    /** "31 candidates, 29 searched: 2 the same as a cheaper part" (or "31 candidates, all searched"). */
    public String summary() {
        if (dropped.isEmpty()) {
            return String.format(Locale.ROOT, "%d candidates, all searched", considered);
        }
        long noRoom = dropped.stream().filter(d -> d.reason() == Reason.NO_ROOM).count();
        long twins = dropped.size() - noRoom;
        List<String> why = new ArrayList<>();
        if (twins > 0) {
            why.add(twins + " the same as a part that costs no more");
        }
        if (noRoom > 0) {
            why.add(noRoom + " with no room for their case");
        }
        return String.format(Locale.ROOT, "%d candidates, %d searched: %s", considered, kept.size(),
                String.join(", ", why));
    }
}
