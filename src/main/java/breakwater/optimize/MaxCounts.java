package breakwater.optimize;

import breakwater.design.Candidates;
import breakwater.catalog.Part;
import breakwater.scenario.Board;
import breakwater.scenario.Scenario;

import java.util.List;

/**
 * The largest count the search tries for each part.
 *
 * <p>In order: the catalog's {@code max_count}; else the default {@code clamp(⌈4·ESR/Z_t⌉, 8, 64)} —
 * enough parts that their ESR in parallel falls to a quarter of the target impedance, never fewer than 8
 * nor more than 64. Either way it is then capped by the board's {@code max_per_case} for the part's
 * case and by {@code max_parts}, and for a candidate in a placement region by that region's room.
 */
public final class MaxCounts {
    public static final int DEFAULT_MIN = 8;
    public static final int DEFAULT_MAX = 64;

    private MaxCounts() {
    }

    /** The largest counts for the parts themselves, on the board node. */
    public static int[] of(List<Part> parts, Scenario scenario) {
        return of(Candidates.of(parts), scenario);
    }

    public static int[] of(Candidates candidates, Scenario scenario) {
        int[] out = new int[candidates.size()];
        double target = scenario.rail().targetImpedanceOhms();
        Board board = scenario.board();
        for (int i = 0; i < out.length; i++) {
            Part p = candidates.part(i);
            int max = p.maxCountLimit().orElseGet(() -> defaultFor(p, target));
            Integer perCase = board.maxPerCase().get(p.caseCode());
            if (perCase != null) {
                max = Math.min(max, perCase);
            }
            if (board.maxPartsLimit().isPresent()) {
                max = Math.min(max, board.maxParts());
            }
            java.util.Optional<breakwater.scenario.Region> region = scenario.region(candidates.region(i));
            if (region.isPresent()) {
                max = Math.min(max, Candidates.room(region.get(), p));
            }
            out[i] = Math.max(0, max);
        }
        return out;
    }

    static int defaultFor(Part p, double targetOhms) {
        double n = Math.ceil(4 * p.esrOhms() / targetOhms);
        return (int) Math.max(DEFAULT_MIN, Math.min(DEFAULT_MAX, n));
    }
}
