package breakwater.design;

import breakwater.catalog.BankEntry;
import breakwater.scenario.CostModel;

import java.math.BigDecimal;

/**
 * What a bank costs per board: cost_total = Σ unit cost × count + placement × total count
 * + line_item × distinct parts.
 */
public record CostBreakdown(double partsCost, double placementCost, double lineItemCost) {

    /**
     * Sums in decimal (prices are decimal numbers as written in the catalog), so a BOM shows 0.84, not
     * 0.8400000000000001.
     */
    public static CostBreakdown of(CapacitorBank bank, CostModel model) {
        BigDecimal parts = BigDecimal.ZERO;
        for (BankEntry e : bank.entries()) {
            parts = parts.add(extended(e));
        }
        return new CostBreakdown(parts.doubleValue(),
                BigDecimal.valueOf(model.placementPerPart()).multiply(BigDecimal.valueOf(bank.totalParts())).doubleValue(),
                BigDecimal.valueOf(model.perLineItem()).multiply(BigDecimal.valueOf(bank.distinctParts())).doubleValue());
    }

    /** unit cost × count, in decimal. */
    public static BigDecimal extended(BankEntry e) {
        return BigDecimal.valueOf(e.part().unitCost()).multiply(BigDecimal.valueOf(e.count()));
    }

    public double total() {
        return BigDecimal.valueOf(partsCost).add(BigDecimal.valueOf(placementCost)).add(BigDecimal.valueOf(lineItemCost))
                .doubleValue();
    }
}
