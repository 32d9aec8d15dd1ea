package breakwater.scenario;

import java.util.Objects;

/**
 * Costs beyond the parts' own price: cost_total = Σ unit cost × count + placement × total count
 * + line_item × distinct parts.
 */
public record CostModel(double placementPerPart, double perLineItem, String currency) {
    public static final CostModel DEFAULT = new CostModel(0, 0, "");

    public CostModel {
        Objects.requireNonNull(currency, "currency");
        if (!(placementPerPart >= 0) || !(perLineItem >= 0)) {
            throw new IllegalArgumentException("placement and line_item costs must be >= 0");
        }
    }
}
