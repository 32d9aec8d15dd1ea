package breakwater.design;

import breakwater.Fixtures;
import breakwater.catalog.Part;
import breakwater.scenario.Die;
import breakwater.scenario.Footprint;
import breakwater.scenario.Rail;
import breakwater.scenario.Scenario;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A footprint with less mounting inductance on every case never makes the cheapest bank dearer, on the
 * small four-part catalog where the optimum is known by complete enumeration (6^4 = 1296 banks).
 */
class FootprintOptimumProperties {
    static final String[] CASES = {"1206", "0805", "0402", "0201"};
    /** The small invented catalog of the search tests, with a case code per part so footprints apply. */
    static final List<Part> PARTS = List.of(
            part("bulk-100u", "1206", 100e-6, 10e-3, 1.5e-9, 0.12),
            part("mid-10u", "0805", 10e-6, 5e-3, 0.6e-9, 0.03),
            part("small-1u", "0402", 1e-6, 15e-3, 0.4e-9, 0.008),
            part("hf-100n", "0201", 100e-9, 30e-3, 0.3e-9, 0.004));

    static Part part(String name, String caseCode, double c, double esr, double esl, double cost) {
        return new Part(name, "", caseCode, "", c, esr, esl, 0.4e-9, cost, Double.NaN, Double.NaN, 1.0, 5);
    }

    @Property(tries = 6)
    void lowerMountingInductanceNeverRaisesTheOptimumCost(
            @ForAll @DoubleRange(min = 0.3, max = 0.9) double firstNh,
            @ForAll @DoubleRange(min = 0.2, max = 0.95) double ratio,
            @ForAll @DoubleRange(min = 0.04, max = 0.06) double tolerance) throws Exception {
        Map<String, Double> wide = new LinkedHashMap<>();
        Map<String, Double> tight = new LinkedHashMap<>();
        for (int i = 0; i < CASES.length; i++) {
            double h = firstNh * 1e-9 * (1 + 0.2 * i);
            wide.put(CASES[i], h);
            tight.put(CASES[i], h * ratio); // lower on every case
        }
        Scenario base = Fixtures.scenario().rail(new Rail("small", 1.0, tolerance, 4.0, 2.0, 0.0))
                .die(new Die(1e-6, 10e-3)).build();
        double first = optimumCost(new BankEvaluator(base, Optional.of(new Footprint("wide", wide))));
        Assume.that(Double.isFinite(first)); // with no feasible bank at all there is nothing to compare
        double second = optimumCost(new BankEvaluator(base, Optional.of(new Footprint("tight", tight))));
        assertThat(second).as("optimum with %s, against %s", tight, wide).isLessThanOrEqualTo(first);
    }

    /** The cheapest feasible bank's cost by complete enumeration; +∞ when none is feasible. */
    static double optimumCost(BankEvaluator ev) {
        CandidateJudge judge = new CandidateJudge(ev, PARTS);
        double best = Double.POSITIVE_INFINITY;
        int[] c = new int[4];
        for (int code = 0; code < 1296; code++) {
            int rest = code;
            for (int i = 0; i < 4; i++) {
                c[i] = rest % 6;
                rest /= 6;
            }
            Judgement j = judge.judge(c);
            if (j.feasible()) {
                best = Math.min(best, j.costTotal());
            }
        }
        return best;
    }
}
