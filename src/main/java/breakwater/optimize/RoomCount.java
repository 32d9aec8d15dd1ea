package breakwater.optimize;

import breakwater.design.Candidates;
import breakwater.scenario.Region;
import breakwater.scenario.Scenario;

import java.util.ArrayList;
import java.util.List;

/**
 * The board's and the regions' room as running counts, so that "does one more part of candidate i still
 * fit?" costs a few comparisons instead of building the bank and checking it
 * ({@link breakwater.design.BoardCheck} states the same limits; a test holds the two together).
 */
final class RoomCount {
    private final Scenario scenario;
    private final Candidates candidates;
    private final int[] caseOf;
    private final int[] caseLimit;
    private final int[] regionOf;
    private final int[] regionLimit;
    private final int[] regionCaseOf;
    private final int[] regionCaseLimit;
    private int total;
    private int distinct;
    private final int[] perPart;
    private final int[] perCase;
    private final int[] perRegion;
    private final int[] perRegionCase;

    RoomCount(Scenario scenario, Candidates candidates) {
        this.scenario = scenario;
        this.candidates = candidates;
        int n = candidates.size();
        List<String> cases = new ArrayList<>(scenario.board().maxPerCase().keySet());
        caseLimit = cases.stream().mapToInt(c -> scenario.board().maxPerCase().get(c)).toArray();
        caseOf = new int[n];
        regionOf = new int[n];
        regionCaseOf = new int[n];
        List<String> regionCases = new ArrayList<>();
        List<Integer> regionCaseMax = new ArrayList<>();
        for (Region r : scenario.regions()) {
            for (var e : r.room().maxPerCase().entrySet()) {
                regionCases.add(r.name() + '\u0000' + e.getKey());
                regionCaseMax.add(e.getValue());
            }
        }
        for (int i = 0; i < n; i++) {
            caseOf[i] = cases.indexOf(candidates.part(i).caseCode());
            regionOf[i] = scenario.regionNames().indexOf(candidates.region(i));
            regionCaseOf[i] = regionCases.indexOf(candidates.region(i) + '\u0000' + candidates.part(i).caseCode());
        }
        regionLimit = scenario.regions().stream().mapToInt(r -> r.room().maxParts()).toArray();
        regionCaseLimit = regionCaseMax.stream().mapToInt(Integer::intValue).toArray();
        perPart = new int[candidates.distinctParts()];
        perCase = new int[caseLimit.length];
        perRegion = new int[regionLimit.length];
        perRegionCase = new int[regionCaseLimit.length];
    }

    /** Starts the counts from {@code counts}. */
    void reset(int[] counts) {
        total = 0;
        distinct = 0;
        java.util.Arrays.fill(perPart, 0);
        java.util.Arrays.fill(perCase, 0);
        java.util.Arrays.fill(perRegion, 0);
        java.util.Arrays.fill(perRegionCase, 0);
        for (int i = 0; i < counts.length; i++) {
            for (int k = 0; k < counts[i]; k++) {
                add(i);
            }
        }
    }

    /** Counts one more part of candidate i. */
    void add(int i) {
        total++;
        if (perPart[candidates.partIndex(i)]++ == 0) {
            distinct++;
        }
        if (caseOf[i] >= 0) {
            perCase[caseOf[i]]++;
        }
        if (regionOf[i] >= 0) {
            perRegion[regionOf[i]]++;
        }
        if (regionCaseOf[i] >= 0) {
            perRegionCase[regionCaseOf[i]]++;
        }
    }

    /** Whether the counts so far plus one part of candidate i break no limit that the addition touches. */
    boolean fitsOneMore(int i) {
        return fits(i, 1);
    }

    /** Whether the counts so far plus {@code k} parts of candidate i break no limit that the addition touches. */
    boolean fits(int i, int k) {
        var board = scenario.board();
        if (board.maxParts() >= 0 && total + k > board.maxParts()) {
            return false;
        }
        if (board.maxDistinct() >= 0 && perPart[candidates.partIndex(i)] == 0 && distinct + 1 > board.maxDistinct()) {
            return false;
        }
        if (caseOf[i] >= 0 && perCase[caseOf[i]] + k > caseLimit[caseOf[i]]) {
            return false;
        }
        if (regionOf[i] >= 0 && regionLimit[regionOf[i]] >= 0 && perRegion[regionOf[i]] + k > regionLimit[regionOf[i]]) {
            return false;
        }
        return regionCaseOf[i] < 0 || perRegionCase[regionCaseOf[i]] + k <= regionCaseLimit[regionCaseOf[i]];
    }
}
