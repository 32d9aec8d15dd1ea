package breakwater.cli;

import breakwater.diagnostic.Suggestions;
import breakwater.optimize.CompareResult;
import breakwater.scenario.Footprint;
import breakwater.scenario.Scenario;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** The footprints {@code compare --footprints} names, checked against the scenario's. */
final class FootprintNames {
    private FootprintNames() {
    }

    /** {@code asked} in order, each known and named once; every footprint of the scenario when none is asked. */
    static List<String> chosen(List<String> asked, Scenario scenario) {
        String catalog = CompareResult.CATALOG;
        Map<String, Footprint> defined = scenario.footprints();
        if (asked == null || asked.isEmpty()) {
            if (defined.isEmpty()) {
                throw new UsageException("compare needs footprints, and " + scenario.source() + " defines none. "
                        + "Maybe add [footprint.NAME] sections (mounting inductance per case, e.g. 0402 = \"0.3 nH\"), "
                        + "or name them with --footprints (the name '" + catalog + "' stands for the catalog's own "
                        + "mount_inductance column)");
            }
            return List.copyOf(defined.keySet());
        }
        List<String> out = new ArrayList<>();
        for (String raw : asked) {
            String n = raw.strip();
            if (n.isEmpty()) {
                throw new UsageException("--footprints has an empty name; write e.g. --footprints two-via,via-in-pad");
            }
            if (!defined.containsKey(n) && !n.equals(catalog)) {
                String known = defined.isEmpty() ? "the scenario defines none"
                        : "the scenario defines " + String.join(", ", defined.keySet());
                String hint = Suggestions.closest(n, defined.keySet()).map(s -> " Did you mean '" + s + "'?").orElse("");
                throw new UsageException("unknown footprint '" + n + "': " + known + " ('" + catalog
                        + "' = the catalog's mounting inductance)." + hint);
            }
            if (out.contains(n)) {
                throw new UsageException("footprint '" + n + "' is named twice in --footprints");
            }
            out.add(n);
        }
        return out;
    }
}
