package breakwater.design;

import breakwater.catalog.Part;
import breakwater.scenario.Region;
import breakwater.scenario.Scenario;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * What the search may count: candidate i is part {@link #part(int)} placed in region {@link #region(int)}
 * ("" without placement regions, docs/network-model.md#placement-regions). Without regions the candidates
 * are the parts themselves; with regions each part is a candidate in every region with room for its case,
 * so the search chooses which parts, how many, and where.
 */
public final class Candidates {
    private final List<Part> parts;
    private final List<String> regions;
    /** Per candidate, the index of its part among the distinct parts (a part in two regions is one part). */
    private final int[] partIndex;
    private final int distinctParts;

    private Candidates(List<Part> parts, List<String> regions) {
        if (parts.size() != regions.size()) {
            throw new IllegalArgumentException("one region per candidate part expected");
        }
        this.parts = List.copyOf(parts);
        this.regions = List.copyOf(regions);
        this.partIndex = new int[parts.size()];
        List<String> names = new ArrayList<>();
        for (int i = 0; i < parts.size(); i++) {
            String name = parts.get(i).name();
            int k = names.indexOf(name);
            if (k < 0) {
                k = names.size();
                names.add(name);
            }
            partIndex[i] = k;
        }
        this.distinctParts = names.size();
    }

    /** The parts themselves as candidates, on the board node (a scenario without regions). */
    public static Candidates of(List<Part> parts) {
        return new Candidates(parts, java.util.Collections.nCopies(parts.size(), ""));
    }

    /** Candidates from explicit pairs: {@code parts.get(i)} in {@code regions.get(i)}. */
    public static Candidates of(List<Part> parts, List<String> regions) {
        return new Candidates(parts, regions);
    }

    /**
     * The candidates of {@code parts} for {@code scenario}: the parts themselves without regions; with
     * regions, every part in every region (in the scenario's region order, then the parts' order) except
     * where the region has no room for it ({@code max_parts = 0}, or {@code max_per_case} of its case 0).
     */
    public static Candidates forScenario(List<Part> parts, Scenario scenario) {
        if (scenario.regions().isEmpty()) {
            return of(parts);
        }
        List<Part> ps = new ArrayList<>();
        List<String> rs = new ArrayList<>();
        for (Region r : scenario.regions()) {
            for (Part p : parts) {
                if (room(r, p) > 0) {
                    ps.add(p);
                    rs.add(r.name());
                }
            }
        }
        return new Candidates(ps, rs);
    }

    /** The most parts like {@code p} that region {@code r} has room for (Integer.MAX_VALUE: no limit). */
    public static int room(Region r, Part p) {
        int max = r.room().maxParts() < 0 ? Integer.MAX_VALUE : r.room().maxParts();
        Integer perCase = r.room().maxPerCase().get(p.caseCode());
        return perCase == null ? max : Math.min(max, perCase);
    }

    public int size() {
        return parts.size();
    }

    public Part part(int i) {
        return parts.get(i);
    }

    public String region(int i) {
        return regions.get(i);
    }

    /** The candidates' parts, candidate order (a part appears once per region it is a candidate in). */
    public List<Part> parts() {
        return parts;
    }

    public List<String> regions() {
        return regions;
    }

    /** Whether the candidates carry placement regions. */
    public boolean placed() {
        return regions.stream().anyMatch(r -> !r.isEmpty());
    }

    /** Index of candidate i's part among the distinct parts, 0 … {@link #distinctParts()} − 1. */
    public int partIndex(int i) {
        return partIndex[i];
    }

    /** How many distinct parts the candidates hold. */
    public int distinctParts() {
        return distinctParts;
    }

    /** The bank with {@code counts[i]} of candidate i. */
    public CapacitorBank bank(int[] counts) {
        return CapacitorBank.of(parts, regions, counts);
    }

    /** The counts of {@code bank} aligned with the candidates (its parts outside them are dropped). */
    public int[] counts(CapacitorBank bank) {
        return bank.countsFor(parts, regions);
    }

    /** The candidates whose part satisfies {@code keep}, in order. */
    public Candidates filter(java.util.function.Predicate<Part> keep) {
        Objects.requireNonNull(keep);
        List<Part> ps = new ArrayList<>();
        List<String> rs = new ArrayList<>();
        for (int i = 0; i < parts.size(); i++) {
            if (keep.test(parts.get(i))) {
                ps.add(parts.get(i));
                rs.add(regions.get(i));
            }
        }
        return new Candidates(ps, rs);
    }
}
