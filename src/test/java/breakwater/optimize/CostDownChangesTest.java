package breakwater.optimize;

import breakwater.catalog.BankEntry;
import breakwater.catalog.Part;
import breakwater.design.CapacitorBank;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** trim's list of changes, per part and placement region. */
class CostDownChangesTest {
    static final Part A = BankSearchTest.PARTS.get(0);
    static final Part B = BankSearchTest.PARTS.get(1);

    @Test
    void aPartMovedBetweenRegionsIsSaidToHaveMoved() {
        CapacitorBank from = new CapacitorBank(List.of(new BankEntry(A, 8, "near"), new BankEntry(A, 12, "far"),
                new BankEntry(B, 4, "far")));
        CapacitorBank to = new CapacitorBank(List.of(new BankEntry(A, 18, "near"), new BankEntry(B, 2, "far")));
        assertThat(CostDown.changes(from, to)).containsExactly(
                new CostDown.Change(A.name(), "near", 8, 18, true),
                new CostDown.Change(A.name(), "far", 12, 0, true),
                new CostDown.Change(B.name(), "far", 4, 2, false));
    }

    @Test
    void withoutRegionsAChangeIsPerPart() {
        CapacitorBank from = new CapacitorBank(List.of(new BankEntry(A, 8), new BankEntry(B, 4)));
        CapacitorBank to = new CapacitorBank(List.of(new BankEntry(A, 6)));
        assertThat(CostDown.changes(from, to)).containsExactly(new CostDown.Change(A.name(), 8, 6),
                new CostDown.Change(B.name(), 4, 0));
    }
}
