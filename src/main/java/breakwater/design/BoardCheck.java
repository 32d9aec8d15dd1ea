package breakwater.design;

import breakwater.catalog.BankEntry;
import breakwater.scenario.Board;
import breakwater.scenario.Region;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/** Board limits a bank breaks (max_parts, max_distinct, max_per_case). */
public final class BoardCheck {
    private BoardCheck() {
    }

    /** One broken limit: which, the limit, the bank's value. */
    public record Violation(String limit, int allowed, int actual) {
        public int excess() {
            return actual - allowed;
        }

        public String describe() {
            return limit + ": " + actual + " placed, " + allowed + " allowed";
        }
    }

    /**
     * The board's limits over the whole bank, then each region's room over the parts placed there
     * ({@code region.NAME.max_parts}, {@code region.NAME.max_per_case.CASE}; a per-case limit of 0 means that
     * case has no room in the region).
     */
    public static List<Violation> violations(CapacitorBank bank, Board board, List<Region> regions) {
        List<Violation> out = new ArrayList<>(violations(bank, board));
        for (Region r : regions) {
            List<BankEntry> here = bank.inRegion(r.name());
            String prefix = "region." + r.name() + ".";
            int placed = here.stream().mapToInt(BankEntry::count).sum();
            r.room().maxPartsLimit().ifPresent(max -> {
                if (placed > max) {
                    out.add(new Violation(prefix + "max_parts", max, placed));
                }
            });
            Map<String, Integer> perCase = new TreeMap<>();
            for (BankEntry e : here) {
                perCase.merge(e.part().caseCode(), e.count(), Integer::sum);
            }
            for (var limit : r.room().maxPerCase().entrySet()) {
                int n = perCase.getOrDefault(limit.getKey(), 0);
                if (n > limit.getValue()) {
                    out.add(new Violation(prefix + "max_per_case." + limit.getKey(), limit.getValue(), n));
                }
            }
        }
        return out;
    }

    public static List<Violation> violations(CapacitorBank bank, Board board) {
        List<Violation> out = new ArrayList<>();
        board.maxPartsLimit().ifPresent(max -> {
            if (bank.totalParts() > max) {
                out.add(new Violation("board.max_parts", max, bank.totalParts()));
            }
        });
        board.maxDistinctLimit().ifPresent(max -> {
            if (bank.distinctParts() > max) {
                out.add(new Violation("board.max_distinct", max, bank.distinctParts()));
            }
        });
        Map<String, Integer> perCase = new TreeMap<>();
        for (BankEntry e : bank.entries()) {
            perCase.merge(e.part().caseCode(), e.count(), Integer::sum);
        }
        for (var limit : board.maxPerCase().entrySet()) {
            int placed = perCase.getOrDefault(limit.getKey(), 0);
            if (placed > limit.getValue()) {
                out.add(new Violation("board.max_per_case." + limit.getKey(), limit.getValue(), placed));
            }
        }
        return out;
    }
}
