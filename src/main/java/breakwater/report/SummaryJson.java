package breakwater.report;

import breakwater.catalog.BankEntry;
import breakwater.design.BoardCheck;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import breakwater.network.AntiResonance;
import breakwater.optimize.SearchResult;
import breakwater.scenario.Rail;
import breakwater.scenario.Scenario;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.IOException;
import java.util.Locale;
import java.io.Writer;

/**
 * summary.json (docs/file-contracts.md#summary-json): the machine-readable result. Numbers are SI, full double precision,
 * locale-independent.
 */
public final class SummaryJson {
    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);

    private SummaryJson() {
    }

    public static ObjectMapper mapper() {
        return MAPPER;
    }

    /** The keys common to every mode: rail, impedance, bank, cost. */
    public static ObjectNode of(String mode, Scenario scenario, String footprintName, Evaluation e) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("mode", mode);
        root.put("scenario", scenario.source());
        root.put("footprint", footprintName);
        Rail r = scenario.rail();
        ObjectNode rail = root.putObject("rail");
        rail.put("name", r.name());
        rail.put("voltage_v", r.voltageV());
        rail.put("tolerance", r.toleranceFraction());
        rail.put("min_current_a", r.minCurrentA());
        rail.put("max_current_a", r.maxCurrentA());
        rail.put("current_step_a", r.currentStepA());
        rail.put("edge_time_s", r.edgeTimeS());
        rail.put("set_point_accuracy", r.setPointFraction());
        rail.put("ripple_v", r.rippleVpp());
        rail.put("transient_allowance_v", r.transientAllowanceV());
        rail.put("tolerance_lower_v", r.toleranceLowerV());
        rail.put("tolerance_upper_v", r.toleranceUpperV());
        rail.put("target_impedance_ohm", r.targetImpedanceOhms());
        rail.put("lower_limit_v", r.lowerLimitV());
        rail.put("upper_limit_v", r.upperLimitV());
        ObjectNode band = root.putObject("band");
        band.put("from_hz", scenario.band().fromHz());
        band.put("to_hz", scenario.band().toHz());

        var wc = e.figures();
        ObjectNode w = root.putObject("worst_case");
        w.put("droop_v", wc.droopV());
        w.put("overshoot_v", wc.overshootV());
        w.put("peak_to_peak_v", wc.droopV() + wc.overshootV());
        w.put("operating_v", wc.operatingV());
        w.put("min_voltage_v", wc.minVoltageV());
        w.put("max_voltage_v", wc.maxVoltageV());
        w.put("lower_limit_v", wc.lowerLimitV());
        w.put("upper_limit_v", wc.upperLimitV());
        w.put("margin_v", wc.marginV());
        w.put("passes", wc.passes());
        w.put("worst_case_ratio", wc.worstCaseRatio());
        w.put("edge_time_s", r.edgeTimeS());
        w.put("droop_ohm", e.worstCase().droopOhms());
        w.put("overshoot_ohm", e.worstCase().overshootOhms());
        w.put("relative_accuracy", e.worstCase().relativeAccuracy());
        ArrayNode ages = w.putArray("droop_older_than");
        for (double[] s : ConsoleReport.droopByAge(e)) {
            ages.addObject().put("age_s", s[0]).put("droop_v", r.currentStepA() * s[1]).put("share", s[2]);
        }
        root.put("worst_case_ratio", wc.worstCaseRatio());

        var m = e.impedance();
        ObjectNode imp = root.putObject("impedance");
        imp.put("peak_ohm", m.peakOhms());
        imp.put("peak_hz", m.peakHz());
        imp.put("peak_over_target", m.peakOverTarget());
        imp.put("min_ohm", m.minOhms());
        imp.put("min_hz", m.minHz());
        imp.put("flatness_db", m.flatnessDb());
        imp.put("dc_resistance_ohm", e.network().dcResistanceOhms());
        ArrayNode ar = root.putArray("anti_resonances");
        var effects = breakwater.design.RegionEffect.of(e);
        for (int i = 0; i < m.antiResonances().size(); i++) {
            AntiResonance a = m.antiResonances().get(i);
            var rf = e.resonances().get(i);
            var rr = rf.response();
            double dI = r.currentStepA();
            ObjectNode o = ar.addObject();
            o.put("frequency_hz", a.frequencyHz());
            o.put("impedance_ohm", a.impedanceOhms());
            o.put("q", a.q());
            o.put("over_target", a.impedanceOhms() / m.targetOhms());
            putNumber(o, "pole_q", rr.q());
            putNumber(o, "step_peak_v", dI * rf.ownStepPeakOhms());
            putNumber(o, "sine_response_v", dI * rr.sineAmplitudeOhms());
            putNumber(o, "square_response_v", dI * rr.squareAmplitudeOhms());
            o.put("cycles_to_95_percent", rr.cyclesTo95Percent());
            if (!effects.get(i).isEmpty()) {
                // |Z| at this peak's frequency with one region's parts removed, per region
                ObjectNode without = o.putObject("impedance_without_region_ohm");
                for (var x : effects.get(i)) {
                    without.put(x.region(), x.withoutOhms());
                }
            }
        }
        ArrayNode bank = root.putArray("bank");
        for (BankEntry be : e.bank().entries()) {
            ObjectNode o = bank.addObject();
            o.put("part", be.part().name());
            o.put("count", be.count());
            o.put("case", be.part().caseCode());
            o.put("unit_cost", be.part().unitCost());
            if (!be.region().isEmpty()) {
                o.put("region", be.region());
            }
        }
        if (!scenario.regions().isEmpty()) {
            // each region: its spreading path, what is placed there, and how much of its room that uses
            ArrayNode regions = root.putArray("regions");
            for (breakwater.scenario.Region region : scenario.regions()) {
                ObjectNode o = regions.addObject();
                o.put("name", region.name());
                o.put("resistance_ohm", region.resistanceOhms());
                o.put("inductance_h", region.inductanceH());
                java.util.List<BankEntry> here = e.bank().inRegion(region.name());
                o.put("parts", here.stream().mapToInt(BankEntry::count).sum());
                if (region.room().maxParts() >= 0) {
                    o.put("max_parts", region.room().maxParts());
                }
                ObjectNode perCase = o.putObject("per_case");
                for (var limit : region.room().maxPerCase().entrySet()) {
                    ObjectNode c = perCase.putObject(limit.getKey());
                    c.put("placed", here.stream().filter(b -> b.part().caseCode().equals(limit.getKey()))
                            .mapToInt(BankEntry::count).sum());
                    c.put("max", limit.getValue());
                }
            }
        }
        root.put("cost_total", e.cost().total());
        ObjectNode cost = root.putObject("cost");
        cost.put("parts", e.cost().partsCost());
        cost.put("placement", e.cost().placementCost());
        cost.put("line_items", e.cost().lineItemCost());
        cost.put("currency", scenario.cost().currency());
        root.put("total_parts", e.bank().totalParts());
        root.put("distinct_parts", e.bank().distinctParts());
        ArrayNode board = root.putArray("board_violations");
        for (BoardCheck.Violation v : e.board()) {
            ObjectNode o = board.addObject();
            o.put("limit", v.limit());
            o.put("allowed", v.allowed());
            o.put("actual", v.actual());
        }
        return root;
    }

    /** Adds {@code solver}: how the search went (seed, solvers, time, evaluations, whether stopped early). */
    public static void solver(ObjectNode root, SearchResult r) {
        ObjectNode s = root.putObject("solver");
        s.put("seed", r.seed());
        s.put("solvers", r.solvers());
        s.put("time_s", r.seconds());
        s.put("evaluations", r.evaluations());
        s.put("stopped_early", r.stoppedEarly());
        r.screening().ifPresent(sc -> {
            ObjectNode o = s.putObject("screening");
            o.put("candidates", sc.considered());
            o.put("searched", sc.kept().size());
            ArrayNode out = o.putArray("left_out");
            for (var d : sc.dropped()) {
                ObjectNode x = out.addObject();
                x.put("part", d.part());
                if (!d.region().isEmpty()) {
                    x.put("region", d.region());
                }
                x.put("reason", d.reason().name().toLowerCase(Locale.ROOT));
                if (!d.keptAs().isEmpty()) {
                    x.put("kept_instead", d.keptAs());
                }
            }
        });
    }

    /** A bank as an array of {@code {part, count}}. */
    static void bank(ArrayNode array, CapacitorBank bank) {
        for (BankEntry be : bank.entries()) {
            array.addObject().put("part", be.part().name()).put("count", be.count());
        }
    }

    /** JSON has no NaN: a figure that does not exist is written as null. */
    static void putNumber(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    public static void write(ObjectNode root, Writer w) throws IOException {
        MAPPER.writeValue(w, root);
        w.write("\n");
    }
}
