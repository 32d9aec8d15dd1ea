package breakwater.design;

import breakwater.catalog.BankEntry;
import breakwater.catalog.Part;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A bank: how many of each part are placed, and where. Entries with count 0 are dropped; a part appears
 * once per placement region (docs/network-model.md#placement-regions; region "" without regions).
 */
public record CapacitorBank(List<BankEntry> entries) {

    public CapacitorBank {
        Map<String, BankEntry> merged = new LinkedHashMap<>();
        Map<String, BankEntry> byName = new LinkedHashMap<>();
        for (BankEntry e : entries) {
            if (e.count() == 0) {
                continue;
            }
            BankEntry same = byName.putIfAbsent(e.part().name(), e);
            if (same != null && !same.part().equals(e.part())) {
                throw new IllegalArgumentException("two different parts named " + e.part().name());
            }
            String key = e.part().name() + '\u0000' + e.region();
            BankEntry old = merged.get(key);
            merged.put(key, old == null ? e : e.withCount(Math.addExact(old.count(), e.count())));
        }
        entries = List.copyOf(merged.values());
    }

    public static final CapacitorBank EMPTY = new CapacitorBank(List.of());

    /** A bank from parallel arrays of parts and counts (counts may be 0). */
    public static CapacitorBank of(List<Part> parts, int[] counts) {
        if (parts.size() != counts.length) {
            throw new IllegalArgumentException("parts and counts differ in length");
        }
        List<BankEntry> list = new ArrayList<>();
        for (int i = 0; i < counts.length; i++) {
            if (counts[i] > 0) {
                list.add(new BankEntry(parts.get(i), counts[i]));
            }
        }
        return new CapacitorBank(list);
    }

    /**
     * A bank from parallel lists of parts, their regions and counts (counts may be 0): candidate i is
     * {@code parts.get(i)} placed in {@code regions.get(i)}.
     */
    public static CapacitorBank of(List<Part> parts, List<String> regions, int[] counts) {
        if (parts.size() != counts.length || regions.size() != counts.length) {
            throw new IllegalArgumentException("parts, regions and counts differ in length");
        }
        List<BankEntry> list = new ArrayList<>();
        for (int i = 0; i < counts.length; i++) {
            if (counts[i] > 0) {
                list.add(new BankEntry(parts.get(i), counts[i], regions.get(i)));
            }
        }
        return new CapacitorBank(list);
    }

    /**
     * Parts in total: exact, since a count is at most {@link BankEntry#MAX_COUNT} and a bank holds at most
     * {@link breakwater.catalog.Catalog#MAX_PARTS} types (the sum is taken in {@code long} and checked).
     */
    public int totalParts() {
        return Math.toIntExact(entries.stream().mapToLong(BankEntry::count).sum());
    }

    /** Distinct part numbers (a part placed in two regions is one line item). */
    public int distinctParts() {
        return (int) entries.stream().map(e -> e.part().name()).distinct().count();
    }

    /** Whether any entry names a placement region. */
    public boolean isPlaced() {
        return entries.stream().anyMatch(e -> !e.region().isEmpty());
    }

    /** The entries in {@code region}, in bank order. */
    public List<BankEntry> inRegion(String region) {
        return entries.stream().filter(e -> e.region().equals(region)).toList();
    }

    /** Parts of {@code partName} in {@code region}. */
    public int count(String partName, String region) {
        return entries.stream().filter(e -> e.part().name().equals(partName) && e.region().equals(region))
                .mapToInt(BankEntry::count).sum();
    }

    /** Counts aligned with candidate i = {@code parts.get(i)} in {@code regions.get(i)}. */
    public int[] countsFor(List<Part> parts, List<String> regions) {
        int[] c = new int[parts.size()];
        for (int i = 0; i < c.length; i++) {
            c[i] = count(parts.get(i).name(), regions.get(i));
        }
        return c;
    }

    /** Parts of {@code partName} over all regions. */
    public int count(String partName) {
        return entries.stream().filter(e -> e.part().name().equals(partName)).mapToInt(BankEntry::count).sum();
    }

    /** Counts aligned with {@code parts} (0 for parts not in the bank). */
    public int[] countsFor(List<Part> parts) {
        int[] c = new int[parts.size()];
        for (int i = 0; i < c.length; i++) {
            c[i] = count(parts.get(i).name());
        }
        return c;
    }
}
