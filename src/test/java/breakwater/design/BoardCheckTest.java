package breakwater.design;

import breakwater.catalog.BankEntry;
import breakwater.catalog.Part;
import breakwater.scenario.Board;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/** Broken board limits, listed in the order the scenario gives them (what the console and summary.json show). */
class BoardCheckTest {
    static Part part(String name, String caseCode) {
        return new Part(name, "", caseCode, "X5R", 1e-6, 10e-3, 0.4e-9, 0.4e-9, 0.01, Double.NaN, Double.NaN, 1, -1);
    }

    @Test
    void perCaseViolationsFollowTheScenariosOrder() {
        // twelve cases, none in sorted order; every one over its limit by one part
        List<String> order = List.of("1206", "0201", "0805", "D", "2220", "0402", "1210", "0603", "1812",
                "0306", "2512", "1008");
        Map<String, Integer> limits = new LinkedHashMap<>();
        List<BankEntry> entries = new ArrayList<>();
        for (String c : order) {
            limits.put(c, 2);
            entries.add(new BankEntry(part("p" + c, c), 3));
        }
        Board board = new Board(30, 5, limits);
        List<BoardCheck.Violation> v = BoardCheck.violations(new CapacitorBank(entries), board);
        // max_parts (36 > 30) and max_distinct (12 > 5) first, then the per-case limits in file order
        assertThat(v.get(0)).isEqualTo(new BoardCheck.Violation("board.max_parts", 30, 36));
        assertThat(v.get(1)).isEqualTo(new BoardCheck.Violation("board.max_distinct", 5, 12));
        assertThat(v.subList(2, v.size())).extracting(BoardCheck.Violation::limit)
                .containsExactlyElementsOf(order.stream().map(c -> "board.max_per_case." + c).toList());
        assertThat(v.subList(2, v.size())).allSatisfy(x -> assertThat(x.excess()).isEqualTo(1));
    }
}
