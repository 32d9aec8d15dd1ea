package breakwater.design;

import breakwater.catalog.BankEntry;
import breakwater.catalog.Part;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A bank: how many of each part are placed. Entries with count 0 are dropped; a part appears once.
 */
public record CapacitorBank(List<BankEntry> entries) {

    public CapacitorBank {
        Map<String, BankEntry> merged = new LinkedHashMap<>();
        for (BankEntry e : entries) {
            if (e.count() == 0) {
                continue;
            }
            BankEntry old = merged.get(e.part().name());
            if (old != null && !old.part().equals(e.part())) {
                throw new IllegalArgumentException("two different parts named " + e.part().name());
            }
            merged.put(e.part().name(), old == null ? e : new BankEntry(e.part(), old.count() + e.count()));
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
     * Parts in total: exact, since a count is at most {@link BankEntry#MAX_COUNT} and a bank holds at most
     * {@link breakwater.catalog.Catalog#MAX_PARTS} types (the sum is taken in {@code long} and checked).
     */
    public int totalParts() {
        return Math.toIntExact(entries.stream().mapToLong(BankEntry::count).sum());
    }

    public int distinctParts() {
        return entries.size();
    }

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
