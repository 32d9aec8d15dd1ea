package breakwater.design;

import breakwater.catalog.BankEntry;
import breakwater.scenario.CostModel;

/**
 * What a bank costs per board: cost_total = Σ unit cost × count + placement × total count
 * + line_item × distinct parts.
 */
public record CostBreakdown(double partsCost, double placementCost, double lineItemCost) {

    public static CostBreakdown of(CapacitorBank bank, CostModel model) {
        double parts = 0;
        for (BankEntry e : bank.entries()) {
            parts += e.part().unitCost() * e.count();
        }
        return new CostBreakdown(parts, model.placementPerPart() * bank.totalParts(),
                model.perLineItem() * bank.distinctParts());
    }

    public double total() {
        return partsCost + placementCost + lineItemCost;
    }
}
