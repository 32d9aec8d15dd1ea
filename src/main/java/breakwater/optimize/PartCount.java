package breakwater.optimize;

import ai.timefold.solver.core.api.domain.common.PlanningId;
import ai.timefold.solver.core.api.domain.entity.PlanningEntity;
import ai.timefold.solver.core.api.domain.valuerange.ValueRange;
import ai.timefold.solver.core.api.domain.valuerange.ValueRangeFactory;
import ai.timefold.solver.core.api.domain.valuerange.ValueRangeProvider;
import ai.timefold.solver.core.api.domain.variable.PlanningVariable;
import breakwater.catalog.Part;

/** Planning entity: how many of one catalog part the bank holds in one placement region (0..maxCount). */
@PlanningEntity
public class PartCount {
    @PlanningId
    private Integer index;
    private Part part;
    /** The placement region, "" without regions. */
    private String region = "";
    private int maxCount;
    @PlanningVariable(valueRangeProviderRefs = "countRange")
    private Integer count;

    /** For the solver's cloning. */
    public PartCount() {
    }

    PartCount(int index, Part part, String region, int maxCount, Integer count) {
        this.index = index;
        this.part = part;
        this.region = region;
        this.maxCount = maxCount;
        this.count = count;
    }

    /** 0..maxCount inclusive (the factory's upper bound is exclusive). */
    @ValueRangeProvider(id = "countRange")
    public ValueRange<Integer> getCountRange() {
        return ValueRangeFactory.createIntValueRange(0, maxCount + 1);
    }

    public Integer getIndex() {
        return index;
    }

    public void setIndex(Integer index) {
        this.index = index;
    }

    public Part getPart() {
        return part;
    }

    public void setPart(Part part) {
        this.part = part;
    }

    public String getRegion() {
        return region;
    }

    public void setRegion(String region) {
        this.region = region;
    }

    public int getMaxCount() {
        return maxCount;
    }

    public void setMaxCount(int maxCount) {
        this.maxCount = maxCount;
    }

    public Integer getCount() {
        return count;
    }

    public void setCount(Integer count) {
        this.count = count;
    }

    /** The count, with "not yet assigned" read as 0. */
    int countOrZero() {
        return count == null ? 0 : count;
    }

    @Override
    public String toString() {
        return part.name() + "=" + count;
    }
}
