package breakwater.report.chart;

import java.util.Arrays;
import java.util.List;

import static breakwater.report.chart.Checks.require;

/**
 * Candidates in a cost–excursion plane: every candidate as a point, the non-dominated ones (no other
 * candidate is both cheaper or equal and lower or equal) joined as a staircase. {@code costUnit} is
 * printed without SI prefix (money); {@code excursionUnit} with one.
 */
public record Frontier(String costLabel, String costUnit, String excursionLabel, String excursionUnit,
                       double[] cost, double[] excursion, List<Limit> excursionLimits,
                       List<LabelledPoint> highlighted) {
    public Frontier {
        require(costLabel != null && costUnit != null && excursionLabel != null
                && excursionUnit != null, "frontier label or unit is null");
        cost = cost.clone();
        excursion = excursion.clone();
        require(cost.length > 0 && cost.length == excursion.length, "frontier has " + cost.length
                + " costs and " + excursion.length + " excursions; it needs the same number, at least one");
        for (int i = 0; i < cost.length; i++) {
            require(Double.isFinite(cost[i]) && Double.isFinite(excursion[i]), "frontier point " + i
                    + " is not finite");
        }
        excursionLimits = List.copyOf(excursionLimits);
        highlighted = List.copyOf(highlighted);
    }

    @Override
    public double[] cost() {
        return cost.clone();
    }

    @Override
    public double[] excursion() {
        return excursion.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Frontier f && Arrays.equals(f.cost, cost) && Arrays.equals(f.excursion, excursion)
                && f.costLabel.equals(costLabel) && f.excursionLabel.equals(excursionLabel)
                && f.costUnit.equals(costUnit) && f.excursionUnit.equals(excursionUnit)
                && f.excursionLimits.equals(excursionLimits) && f.highlighted.equals(highlighted);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(cost) * 31 + Arrays.hashCode(excursion);
    }

    @Override
    public String toString() {
        return "Frontier[" + cost.length + " candidates]";
    }
}
