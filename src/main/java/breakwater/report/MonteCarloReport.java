package breakwater.report;

import breakwater.design.MonteCarlo;
import breakwater.report.chart.Histogram;
import breakwater.report.chart.HistogramChart;
import breakwater.report.chart.Limit;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static breakwater.report.Figures.format;
import static breakwater.units.Quantity.FRACTION;
import static breakwater.units.Quantity.VOLTAGE;

/** Console text, report section and summary.json keys of a Monte Carlo run. */
public final class MonteCarloReport {
    private MonteCarloReport() {
    }

    /** The run's console text, summary keys and report section together; nothing when there was no run. */
    static ModeOutput output(java.util.Optional<MonteCarlo.Result> run) {
        return run.map(r -> new ModeOutput(console(r), json -> summary(json, r), List.of(section(r)),
                        m -> Overlays.withKeyFigure(m, yieldCard(r))))
                .orElse(ModeOutput.NONE);
    }

    /** The yield as a key figure: red under the 95 % that the verdict's caution uses ({@code Verdict}). */
    static ReportModel.KeyFigure yieldCard(MonteCarlo.Result r) {
        long inside = Math.round(r.yieldFraction() * r.settings().samples());
        return new ReportModel.KeyFigure("Yield (Monte Carlo)", String.format(Locale.ROOT, "%.1f %% (%d of %d samples)",
                100 * r.yieldFraction(), inside, r.settings().samples()),
                r.yieldFraction() >= breakwater.design.Verdict.YIELD_CAUTION ? ReportModel.Tone.GOOD : ReportModel.Tone.BAD);
    }

    /** Bins of the histograms: about √N, between 10 and 60. */
    static int bins(int samples) {
        return (int) Math.max(10, Math.min(60, Math.round(Math.sqrt(samples))));
    }

    public static String console(MonteCarlo.Result r) {
        var s = r.settings();
        double seconds = r.seconds();
        var nom = r.nominal();
        var d = r.droop();
        var o = r.overshoot();
        StringBuilder b = new StringBuilder();
        b.append(String.format(Locale.ROOT, "%-10s %d samples, seed %d, ESR/ESL spread ±%s, in %.1f s%n", "Spread",
                s.samples(), s.seed(), format(s.spreadFraction(), FRACTION), seconds));
        b.append(String.format(Locale.ROOT, "%-10s each part type moves as one batch (all its parts together); "
                + "capacitance within its tolerance, uniform%n", ""));
        b.append(String.format(Locale.ROOT, "%-10s %s%n", "", layout(s)));
        b.append(String.format(Locale.ROOT, "  %-10s %10s %10s %10s %10s %10s %10s%n", "", "nominal", "p50", "p95",
                "p99", "max", "allowed"));
        b.append(String.format(Locale.ROOT, "  %-10s %10s %10s %10s %10s %10s %10s%n", "droop",
                format(nom.droopV(), VOLTAGE), format(d.p50(), VOLTAGE), format(d.p95(), VOLTAGE),
                format(d.p99(), VOLTAGE), format(d.max(), VOLTAGE),
                format(nom.operatingV() - nom.lowerLimitV(), VOLTAGE)));
        b.append(String.format(Locale.ROOT, "  %-10s %10s %10s %10s %10s %10s %10s%n", "overshoot",
                format(nom.overshootV(), VOLTAGE), format(o.p50(), VOLTAGE), format(o.p95(), VOLTAGE),
                format(o.p99(), VOLTAGE), format(o.max(), VOLTAGE),
                format(nom.upperLimitV() - nom.operatingV(), VOLTAGE)));
        b.append(String.format(Locale.ROOT, "%-10s %.1f %% of the samples stay inside %s .. %s (%d of %d)%n", "Yield",
                100 * r.yieldFraction(), ConsoleReport.volts(nom.lowerLimitV()), ConsoleReport.volts(nom.upperLimitV()),
                r.passing(), s.samples()));
        return b.toString();
    }

    /** The layout and stack-up spreads in words. */
    static String layout(MonteCarlo.Settings s) {
        MonteCarlo.StackupSpread st = s.stackup();
        return "mounting inductance within ±" + format(s.mountSpreadFraction(), FRACTION) + " per part type; "
                + (st.any() ? "plane C and R within ±" + format(st.planeFraction(), FRACTION) + ", package R and L within ±"
                + format(st.packageFraction(), FRACTION) + ", die C and R within ±" + format(st.dieFraction(), FRACTION)
                : "plane, package and die as given");
    }

    public static ReportModel.Section section(MonteCarlo.Result r) {
        var s = r.settings();
        double seconds = r.seconds();
        var nom = r.nominal();
        double allowedDroop = nom.operatingV() - nom.lowerLimitV();
        double allowedOver = nom.upperLimitV() - nom.operatingV();
        List<List<String>> rows = new ArrayList<>();
        for (String what : List.of("droop", "overshoot")) {
            boolean droop = what.equals("droop");
            MonteCarlo.Distribution d = droop ? r.droop() : r.overshoot();
            rows.add(List.of("worst " + what, format(droop ? nom.droopV() : nom.overshootV(), VOLTAGE),
                    format(d.p50(), VOLTAGE), format(d.p95(), VOLTAGE), format(d.p99(), VOLTAGE),
                    format(d.max(), VOLTAGE), format(droop ? allowedDroop : allowedOver, VOLTAGE)));
        }
        ReportModel.Table dist = new ReportModel.Table("Worst case over the samples (nearest-rank percentiles)",
                List.of("figure", "nominal", "p50", "p95", "p99", "max", "allowed"), rows);
        List<List<String>> partRows = new ArrayList<>();
        for (MonteCarlo.PartSpread p : r.parts()) {
            partRows.add(List.of(p.part(), Integer.toString(p.count()), "±" + format(p.capacitanceTolerance(), FRACTION),
                    p.toleranceSource(), "±" + format(p.spreadFraction(), FRACTION)));
        }
        ReportModel.Table parts = new ReportModel.Table("How each part type was varied",
                List.of("part", "count", "capacitance", "tolerance from", "ESR and ESL"), partRows);
        String droopChart = HistogramChart.svg(new Histogram("worst droop", "V", r.droopV(), bins(s.samples()),
                List.of(new Limit("allowed droop " + format(allowedDroop, VOLTAGE), allowedDroop)), allowedDroop));
        String overChart = HistogramChart.svg(new Histogram("worst overshoot", "V", r.overshootV(),
                bins(s.samples()), List.of(new Limit("allowed overshoot " + format(allowedOver, VOLTAGE),
                allowedOver)), allowedOver));
        String text = String.format(Locale.ROOT, "%d Monte Carlo samples were judged (seed %d, %.1f s). In each sample, every part type's "
                        + "capacitance is drawn uniformly within its tolerance and its ESR and ESL within ±%s; all "
                        + "parts of one type move together, as a batch from one reel would (the pessimistic "
                        + "choice: independent parts would partly cancel). %s. Each "
                        + "sample's exact worst case is computed. Yield: %.1f %% of the samples keep V_min and "
                        + "V_max inside %s .. %s.",
                s.samples(), s.seed(), seconds, format(s.spreadFraction(), FRACTION),
                Character.toUpperCase(layout(s).charAt(0)) + layout(s).substring(1), 100 * r.yieldFraction(),
                ConsoleReport.volts(nom.lowerLimitV()), ConsoleReport.volts(nom.upperLimitV()));
        return new ReportModel.Section("Part-to-part spread (Monte Carlo)", List.of(text), List.of(dist, parts),
                List.of(droopChart, overChart));
    }

    /** Adds {@code monte_carlo} to summary.json. */
    public static void summary(ObjectNode root, MonteCarlo.Result r) {
        var s = r.settings();
        double seconds = r.seconds();
        ObjectNode mc = root.putObject("monte_carlo");
        mc.put("samples", s.samples());
        mc.put("seed", s.seed());
        mc.put("spread", s.spreadFraction());
        mc.put("mount_spread", s.mountSpreadFraction());
        mc.put("plane_spread", s.stackup().planeFraction());
        mc.put("package_spread", s.stackup().packageFraction());
        mc.put("die_spread", s.stackup().dieFraction());
        mc.put("yield", r.yieldFraction());
        mc.put("passing", r.passing());
        mc.put("time_s", seconds);
        mc.put("percentile_method", "nearest-rank");
        put(mc.putObject("droop_v"), r.droop());
        put(mc.putObject("overshoot_v"), r.overshoot());
        var parts = mc.putArray("parts");
        for (MonteCarlo.PartSpread p : r.parts()) {
            ObjectNode o = parts.addObject();
            o.put("part", p.part());
            o.put("capacitance_tolerance", p.capacitanceTolerance());
            o.put("tolerance_source", p.toleranceSource());
        }
    }

    private static void put(ObjectNode o, MonteCarlo.Distribution d) {
        o.put("p50", d.p50());
        o.put("p95", d.p95());
        o.put("p99", d.p99());
        o.put("max", d.max());
    }
}
