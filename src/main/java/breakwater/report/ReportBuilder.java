package breakwater.report;

import breakwater.report.chart.ImpedanceMarker;
import breakwater.report.chart.ImpedancePlot;
import breakwater.report.chart.ImpedanceSeries;
import breakwater.report.chart.WaveformPlot;
import breakwater.report.chart.WaveformSeries;
import breakwater.catalog.BankEntry;
import breakwater.design.Evaluation;
import breakwater.design.Verdict;
import breakwater.network.AntiResonance;
import breakwater.optimize.SearchResult;
import breakwater.report.chart.WorstCaseChart;
import breakwater.scenario.Rail;
import breakwater.scenario.Scenario;
import breakwater.timedomain.Waveform;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import static breakwater.report.Figures.format;
import static breakwater.units.Quantity.CURRENT;
import static breakwater.units.Quantity.FREQUENCY;
import static breakwater.units.Quantity.FRACTION;
import static breakwater.units.Quantity.RESISTANCE;
import static breakwater.units.Quantity.TIME;
import static breakwater.units.Quantity.VOLTAGE;

/** Turns an evaluated bank into the data of the HTML report. */
public final class ReportBuilder {
    /** Waveforms are thinned to about this many points for plotting (extremes are kept). */
    static final int PLOT_POINTS = 2400;

    private ReportBuilder() {
    }

    /** Everything a run knows about its bank, for the report. */
    public record Run(String mode, Scenario scenario, String footprintName, Evaluation evaluation, Verdict verdict,
                      Waveform droop, Waveform overshoot, Optional<SearchResult> search,
                      List<ReportModel.Section> extraSections) {
        public Run {
            extraSections = List.copyOf(extraSections);
        }
    }

    public static ReportModel build(Run run) {
        Scenario s = run.scenario();
        Rail r = s.rail();
        Evaluation e = run.evaluation();
        var wc = e.figures();
        var m = e.impedance();
        String currency = s.cost().currency();

        List<String> subtitle = new ArrayList<>();
        subtitle.add(ConsoleReport.volts(r.voltageV()) + " ± " + format(r.toleranceFraction(), FRACTION) + " ("
                + ConsoleReport.volts(r.toleranceLowerV()) + " .. " + ConsoleReport.volts(r.toleranceUpperV()) + "); load "
                + format(r.minCurrentA(), CURRENT) + " .. " + format(r.maxCurrentA(), CURRENT) + ", ΔI "
                + format(r.currentStepA(), CURRENT) + "; "
                + (r.hasEdgeTime() ? "edge time " + format(r.edgeTimeS(), TIME) : "ideal load edges"));
        if (r.hasBudget()) {
            subtitle.add("Tolerance budget: " + ConsoleReport.budget(r));
        }
        subtitle.add("Target impedance Z_t = " + ConsoleReport.targetRule(r) + " = " + format(r.targetImpedanceOhms(), RESISTANCE)
                + "; band " + format(s.band().fromHz(), FREQUENCY) + " .. " + format(s.band().toHz(), FREQUENCY)
                + (run.footprintName().isEmpty() ? "" : "; footprint " + run.footprintName()));
        subtitle.add("Scenario " + s.source() + (s.requireTarget() ? "; |Z| must also stay under the target" : ""));

        ReportModel.Verdict verdict = Verdicts.report(run.verdict());

        List<ReportModel.KeyFigure> keys = new ArrayList<>();
        ReportModel.Tone wcTone = wc.passes() ? ReportModel.Tone.GOOD : ReportModel.Tone.BAD;
        keys.add(new ReportModel.KeyFigure("Worst droop", format(wc.droopV(), VOLTAGE),
                wc.droopExcessV() > 0 ? ReportModel.Tone.BAD : ReportModel.Tone.GOOD));
        keys.add(new ReportModel.KeyFigure("Worst overshoot", format(wc.overshootV(), VOLTAGE),
                wc.overshootExcessV() > 0 ? ReportModel.Tone.BAD : ReportModel.Tone.GOOD));
        // each limit's card turns red only when that limit fails
        keys.add(new ReportModel.KeyFigure("V_min (limit " + ConsoleReport.volts(wc.lowerLimitV()) + ")",
                ConsoleReport.volts(wc.minVoltageV()),
                wc.droopExcessV() > 0 ? ReportModel.Tone.BAD : ReportModel.Tone.GOOD));
        keys.add(new ReportModel.KeyFigure("V_max (limit " + ConsoleReport.volts(wc.upperLimitV()) + ")",
                ConsoleReport.volts(wc.maxVoltageV()),
                wc.overshootExcessV() > 0 ? ReportModel.Tone.BAD : ReportModel.Tone.GOOD));
        keys.add(new ReportModel.KeyFigure("Margin to the limits", format(wc.marginV(), VOLTAGE), wcTone));
        keys.add(new ReportModel.KeyFigure("Worst-case ratio", String.format(Locale.ROOT, "%.2f × ΔI·Z_t", wc.worstCaseRatio())));
        keys.add(new ReportModel.KeyFigure("Peak |Z|", format(m.peakOhms(), RESISTANCE) + " at "
                + format(m.peakHz(), FREQUENCY, 4) + String.format(Locale.ROOT, " (%.2f × Z_t)", m.peakOverTarget()),
                s.requireTarget() ? (m.underTarget() ? ReportModel.Tone.GOOD : ReportModel.Tone.BAD) : ReportModel.Tone.NEUTRAL));
        keys.add(new ReportModel.KeyFigure("Flatness in the band (max/min |Z|)", String.format(Locale.ROOT, "%.2f dB", m.flatnessDb())));
        keys.add(new ReportModel.KeyFigure("Cost per board", ConsoleReport.money(e.cost().total())
                + (currency.isEmpty() ? "" : " " + currency)));
        keys.add(new ReportModel.KeyFigure("Parts", e.bank().totalParts() + " (" + e.bank().distinctParts() + " types)",
                e.fitsBoard() ? ReportModel.Tone.NEUTRAL : ReportModel.Tone.BAD));

        List<ImpedanceMarker> markers = new ArrayList<>();
        for (AntiResonance a : m.antiResonances()) {
            markers.add(new ImpedanceMarker(format(a.frequencyHz(), FREQUENCY), a.frequencyHz(), a.impedanceOhms()));
        }
        ImpedancePlot imp = new ImpedancePlot(List.of(impedanceSeries("|Z| at the load", e)),
                r.targetImpedanceOhms(), s.band().fromHz(), s.band().toHz(), markers);
        WaveformPlot wave = new WaveformPlot(
                List.of(waveformSeries("worst-case droop pattern", run.droop())), r.voltageV(), r.lowerLimitV(), r.upperLimitV());

        List<ReportModel.BomRow> rows = new ArrayList<>();
        for (BankEntry be : e.bank().entries()) {
            rows.add(new ReportModel.BomRow(be.part().name(), be.part().description(), be.part().caseCode(), be.count(),
                    be.part().unitCost(), be.part().unitCost() * be.count(), be.region()));
        }
        ReportModel.Bom bom = new ReportModel.Bom(rows, e.cost().total(), currency, String.format(Locale.ROOT,
                "parts %.4f + placement %.4f + line items %.4f", e.cost().partsCost(), e.cost().placementCost(),
                e.cost().lineItemCost()));

        List<List<String>> resRows = new ArrayList<>();
        for (int i = 0; i < m.antiResonances().size(); i++) {
            AntiResonance a = m.antiResonances().get(i);
            var rf = e.resonances().get(i);
            var rr = rf.response();
            double dI = r.currentStepA();
            boolean rings = rf.rings();
            resRows.add(List.of(format(a.frequencyHz(), FREQUENCY, 4), format(a.impedanceOhms(), RESISTANCE),
                    String.format(Locale.ROOT, "%.2f", a.impedanceOhms() / m.targetOhms()),
                    String.format(Locale.ROOT, "%.2f", a.q()),
                    rings ? String.format(Locale.ROOT, "%.2f", rr.q()) : "-",
                    rings ? format(dI * rf.ownStepPeakOhms(), VOLTAGE) : "-",
                    rings ? format(dI * rr.sineAmplitudeOhms(), VOLTAGE) : "-",
                    rings ? format(dI * rr.squareAmplitudeOhms(), VOLTAGE) : "-",
                    rr.cyclesTo95Percent() > 0 ? Integer.toString(rr.cyclesTo95Percent()) : "-"));
        }
        ReportModel.Table resonances = new ReportModel.Table(
                "Anti-resonances in the band (local maxima of |Z|) and the rail's response to a load swinging by ΔI: "
                        + "to a ΔI step (the peak of the mode ringing there), to a resonant sine and to a resonant 50 % "
                        + "square wave (steady-state amplitude), and the cycles of resonant drive until the sine "
                        + "response reaches 95 % of its steady state. "
                        + "Q is the sharpness of the |Z| peak; pole Q the damping of the mode that rings there.",
                List.of("frequency", "|Z|", "|Z| / Z_t", "Q", "pole Q", "response to a ΔI step", "to a resonant sine",
                        "to a resonant 50 % square", "cycles to 95 %"),
                resRows);

        List<ReportModel.Section> sections = new ArrayList<>();
        sections.add(ReportModel.Section.text("What the worst case means",
                "The worst droop is the largest sag below the I_min operating point that ANY load current between "
                        + format(r.minCurrentA(), CURRENT) + " and " + format(r.maxCurrentA(), CURRENT)
                        + (r.hasEdgeTime() ? " slewing no faster than ΔI in " + format(r.edgeTimeS(), TIME) : "")
                        + " can cause in this model; no pattern can do worse, and the pattern drawn above reaches it ("
                        + ConsoleReport.accuracy(e.worstCase().relativeAccuracy()) + "). "
                        + "The target impedance promises an excursion of ΔI·Z_t = "
                        + format(r.currentStepA() * r.targetImpedanceOhms(), VOLTAGE)
                        + "; a load that switches at the rhythm of the anti-resonances piles their ringing up, which is "
                        + "why the worst case can be several times larger. Here it is "
                        + String.format(Locale.ROOT, "%.2f", wc.worstCaseRatio()) + " × ΔI·Z_t (the worst-case ratio: worst excursion / ΔI·Z_t)"
                        + (wc.worstCaseRatio() < 1 ? ": this bank keeps |Z| well under the target, so it stays inside the promise."
                        : ": the target impedance alone would have promised too little.")));
        double window = closeUpWindowS(m, r.edgeTimeS(), run.droop());
        WaveformSeries close = crop("worst-case droop pattern, close-up", run.droop(), window);
        if (close != null) {
            sections.add(ReportModel.Section.text("Close-up: the last " + format(window, TIME) + " before the worst instant",
                    "The fast part of the same droop pattern, with time counted from the worst instant: how the "
                            + "load times its swings against the highest anti-resonances" + (r.hasEdgeTime() ? ", never faster than ΔI in " + format(r.edgeTimeS(), TIME) : "")
                            + ".")
                    .withChart(WorstCaseChart.svg(new WaveformPlot(List.of(close), r.voltageV(),
                            r.lowerLimitV(), r.upperLimitV()))));
        }
        sections.add(ReportModel.Section.text("Worst-case overshoot pattern",
                "The load pattern that drives the voltage highest above the operating point (peak "
                        + ConsoleReport.volts(wc.maxVoltageV()) + ", limit " + ConsoleReport.volts(wc.upperLimitV()) + ").")
                .withChart(WorstCaseChart.svg(new WaveformPlot(
                        List.of(waveformSeries("worst-case overshoot pattern", run.overshoot())),
                        r.voltageV(), r.lowerLimitV(), r.upperLimitV()))));
        sections.add(modelLimits(e, r));
        placement(s, e).ifPresent(sections::add);
        sections.addAll(run.extraSections());

        List<List<String>> settings = new ArrayList<>();
        settings.add(List.of("mode", run.mode()));
        settings.add(List.of("scenario", s.source()));
        settings.add(List.of("catalog", s.catalogFile().getFileName().toString()));
        settings.add(List.of("footprint", run.footprintName().isEmpty() ? "catalog mounting inductance" : run.footprintName()));
        run.search().ifPresent(sr -> {
            settings.add(List.of("seed", Long.toString(sr.seed())));
            settings.add(List.of("solvers", Integer.toString(sr.solvers())));
            settings.add(List.of("search time", String.format(Locale.ROOT, "%.1f s", sr.seconds())));
            settings.add(List.of("banks evaluated", Long.toString(sr.evaluations())));
            settings.add(List.of("stopped by the user", Boolean.toString(sr.stoppedEarly())));
            sr.screening().ifPresent(sc -> settings.add(List.of("screening", sc.summary())));
        });
        settings.add(List.of("Breakwater", Optional.ofNullable(ReportBuilder.class.getPackage().getImplementationVersion())
                .orElse("development build")));
        ReportModel.Table settingsTable = new ReportModel.Table("Settings", List.of("setting", "value"), settings);

        List<String> cautions = List.of(ReportModel.STANDARD_CAUTION,
                "The worst case is exact for the lumped model only. The model leaves out: the regulator's control "
                        + "loop (the regulator is its output impedance above its loop bandwidth, R + sL, so activity "
                        + "slower than the loop is answered without loop delay, peaking or current limits, which "
                        + "likely makes that part of the droop optimistic); spreading and mutual inductance beyond the "
                        + "regions and footprints given (optimistic at the highest anti-resonances, where many "
                        + "parts share planes and vias); ESR and capacitance that change with frequency, "
                        + "temperature, ageing and DC bias beyond the catalog's single retention figure (the "
                        + "damping of each anti-resonance, and so its worst case, can be off either way); and a "
                        + "load whose current depends on its voltage (a constant-power load draws more as the "
                        + "voltage sags, which makes the droop optimistic). See \"What the model leaves out\" above.",
                "Keep every part inside its voltage, ripple-current and temperature ratings; check the real "
                        + "datasheets, not the catalog's typical values.");
        return new ReportModel("Breakwater — " + (r.name().isEmpty() ? s.source() : r.name()), subtitle, verdict, keys,
                imp, wave, bom, resonances, sections, settingsTable, cautions);
    }

    /** The model's limits in plain words, with the part of the droop due to older load activity. */
    private static ReportModel.Section modelLimits(Evaluation e, Rail r) {
        List<List<String>> rows = new ArrayList<>();
        for (double[] s : ConsoleReport.droopByAge(e)) {
            rows.add(List.of("older than " + format(s[0], TIME), format(r.currentStepA() * s[1], VOLTAGE),
                    ConsoleReport.percent(s[2], 1)));
        }
        ReportModel.Table table = new ReportModel.Table("Part of the worst droop due to load activity older than "
                + "each time before the worst instant (the pattern's response with the load held at I_min for "
                + "that long before the worst instant)", List.of("load activity", "droop", "share"), rows);
        return new ReportModel.Section("What the model leaves out", List.of(
                "The regulator is modelled as its output impedance above its loop bandwidth (R + sL), with no "
                        + "control loop. Activity slower than the loop is answered as by a plain inductance: no "
                        + "loop delay, no impedance peak near the loop's crossover, no limit on how fast the "
                        + "regulator's own inductor current can slew. A real loop rarely does better and often "
                        + "does worse, so the part of the droop due to activity older than the loop's response "
                        + "time (about 1/(2π·f_loop): 1.6 µs at 100 kHz, 16 µs at 10 kHz) rests on the regulator "
                        + "model alone and is likely optimistic; check it against the regulator's own data or a "
                        + "measurement. The table below says how much of the droop that is.",
                "Spreading and mutual inductance beyond what the regions and footprints give: parts that share "
                        + "planes and vias do not divide their mounting inductance by their count; this matters "
                        + "most at the highest anti-resonances, where the model is then optimistic.",
                "ESR and capacitance are constant with frequency (real ESR rises with frequency and "
                        + "capacitance falls towards a part's own resonance); this sets the damping, and so the "
                        + "worst case, of each anti-resonance, and can err either way.",
                "The load draws a current that does not depend on its voltage. A constant-power load draws more "
                        + "as the voltage sags (the droop is then optimistic); a load that behaves like a "
                        + "resistance draws less (pessimistic). This matters most when the droop is a large share "
                        + "of the voltage."), List.of(table), List.of());
    }

    /**
     * The placement section of a scenario with regions: the regions as boxes (path, parts, room used) and,
     * per anti-resonance, |Z| with each region's parts removed.
     */
    static Optional<ReportModel.Section> placement(breakwater.scenario.Scenario s, Evaluation e) {
        if (s.regions().isEmpty()) {
            return Optional.empty();
        }
        List<breakwater.report.chart.PlacementChart.Box> boxes = new ArrayList<>();
        for (breakwater.scenario.Region region : s.regions()) {
            List<BankEntry> here = e.bank().inRegion(region.name());
            int placed = here.stream().mapToInt(BankEntry::count).sum();
            double used = Double.NaN;
            List<String> lines = new ArrayList<>();
            for (BankEntry be : here) {
                lines.add(be.count() + " × " + be.part().name());
            }
            List<String> noRoom = new ArrayList<>();
            for (var limit : region.room().maxPerCase().entrySet()) {
                int n = here.stream().filter(b -> b.part().caseCode().equals(limit.getKey())).mapToInt(BankEntry::count).sum();
                if (limit.getValue() == 0 && n == 0) {
                    noRoom.add(limit.getKey());
                    continue;
                }
                lines.add("case " + limit.getKey() + ": " + n + " of " + limit.getValue());
                if (limit.getValue() > 0) {
                    used = Double.isNaN(used) ? (double) n / limit.getValue() : Math.max(used, (double) n / limit.getValue());
                }
            }
            for (int k = 0; k < noRoom.size(); k += 3) {
                // three cases a line, so the text stays inside the box
                lines.add((k == 0 ? "no room for " : "  ") + String.join(", ", noRoom.subList(k, Math.min(k + 3,
                        noRoom.size()))) + (k + 3 < noRoom.size() ? "," : ""));
            }
            if (region.room().maxParts() > 0) {
                double share = (double) placed / region.room().maxParts();
                used = Double.isNaN(used) ? share : Math.max(used, share);
            }
            String path = format(region.resistanceOhms(), RESISTANCE) + " + "
                    + format(region.inductanceH(), breakwater.units.Quantity.INDUCTANCE);
            String room = region.room().maxParts() >= 0 ? placed + " parts of " + region.room().maxParts()
                    : placed + " part" + Texts.plural(placed) + " (no limit)";
            boxes.add(new breakwater.report.chart.PlacementChart.Box(region.name(), path, room, used, lines));
        }
        String svg = breakwater.report.chart.PlacementChart.svg(
                s.packagePath().present() ? "board node (package to the load)" : "board node (the load)", boxes);
        List<List<String>> rows = new ArrayList<>();
        var effects = breakwater.design.RegionEffect.of(e);
        List<String> names = e.network().regions().stream().filter(r -> !r.branches().isEmpty())
                .map(breakwater.network.RegionPath::name).toList();
        for (int i = 0; i < effects.size(); i++) {
            AntiResonance a = e.impedance().antiResonances().get(i);
            List<String> row = new ArrayList<>();
            row.add(format(a.frequencyHz(), FREQUENCY));
            row.add(format(a.impedanceOhms(), RESISTANCE));
            for (var x : effects.get(i)) {
                row.add(format(x.withoutOhms(), RESISTANCE) + String.format(Locale.ROOT, " (× %.2f)", x.rise()));
            }
            rows.add(row);
        }
        List<String> headers = new ArrayList<>(List.of("anti-resonance", "|Z| as placed"));
        for (String n : names) {
            headers.add("without " + n);
        }
        List<ReportModel.Table> tables = rows.isEmpty() ? List.of()
                : List.of(new ReportModel.Table("|Z| at each anti-resonance with one region's parts removed",
                        headers, rows));
        return Optional.of(new ReportModel.Section("Placement", List.of("Each region reaches the board node through its"
                + " own spreading path (resistance + inductance), in series with every part placed there. The bar shows"
                + " the share of the region's room in use (its tightest limit).",
                "How much each region's parts hold down each peak: |Z| at that frequency if the region's parts were"
                + " removed, and how many times the peak as placed that is."), tables, List.of(svg)));
    }

    /**
     * Length of the close-up: eight periods of the highest anti-resonance in the band (at least 40 edge
     * times), but never more than half the pattern.
     */
    static double closeUpWindowS(breakwater.network.ImpedanceMetrics m, double edgeTimeS, Waveform w) {
        double fTop = m.antiResonances().stream().mapToDouble(AntiResonance::frequencyHz).max().orElse(0);
        double window = fTop > 0 ? 8 / fTop : 0;
        window = Math.max(window, 40 * edgeTimeS);
        double length = w.worstInstantS();
        return window > 0 ? Math.min(window, length / 2) : length / 2;
    }

    /**
     * The part of {@code w} from {@code window} before its worst instant to a quarter window after, with time
     * counted from the worst instant; null if too short.
     */
    static WaveformSeries crop(String label, Waveform w, double window) {
        double[] t = w.timeS();
        double[] i = w.loadCurrentA();
        double[] v = w.voltageV();
        double from = w.worstInstantS() - window;
        double to = w.worstInstantS() + window / 4;
        int a = 0;
        while (a < t.length && t[a] < from) {
            a++;
        }
        int b = a;
        while (b < t.length && t[b] <= to) {
            b++;
        }
        if (b - a < 4) {
            return null;
        }
        double[] tt = java.util.Arrays.copyOfRange(t, a, b);
        for (int k = 0; k < tt.length; k++) {
            tt[k] -= w.worstInstantS(); // time 0 is the worst instant
        }
        double[] ii = java.util.Arrays.copyOfRange(i, a, b);
        double[] vv = java.util.Arrays.copyOfRange(v, a, b);
        return thin(tt, ii, vv, PLOT_POINTS).labelled(label);
    }

    static ImpedanceSeries impedanceSeries(String label, Evaluation e) {
        var c = e.curve();
        double[] mag = new double[c.size()];
        for (int i = 0; i < mag.length; i++) {
            mag[i] = c.magnitudeOhms(i);
        }
        return new ImpedanceSeries(label, c.frequenciesHz(), mag);
    }

    static WaveformSeries waveformSeries(String label, Waveform w) {
        return thin(w.timeS(), w.loadCurrentA(), w.voltageV(), PLOT_POINTS).labelled(label);
    }

    /**
     * Thins a waveform for plotting: splits it into buckets of equal sample count and keeps, from each, the
     * first sample and the samples with the lowest and highest voltage, so peaks survive.
     */
    static Samples thin(double[] t, double[] i, double[] v, int target) {
        int n = t.length;
        if (n <= target) {
            return new Samples(t, i, v);
        }
        int buckets = target / 3;
        List<Integer> keep = new ArrayList<>();
        for (int b = 0; b < buckets; b++) {
            int lo = (int) ((long) b * n / buckets);
            int hi = (int) ((long) (b + 1) * n / buckets);
            int min = lo;
            int max = lo;
            for (int k = lo; k < hi; k++) {
                if (v[k] < v[min]) {
                    min = k;
                }
                if (v[k] > v[max]) {
                    max = k;
                }
            }
            int[] pick = {lo, Math.min(min, max), Math.max(min, max)};
            for (int k : pick) {
                if (keep.isEmpty() || keep.get(keep.size() - 1) < k) {
                    keep.add(k);
                }
            }
        }
        if (keep.get(keep.size() - 1) != n - 1) {
            keep.add(n - 1);
        }
        double[] tt = new double[keep.size()];
        double[] ii = new double[keep.size()];
        double[] vv = new double[keep.size()];
        for (int k = 0; k < keep.size(); k++) {
            int idx = keep.get(k);
            tt[k] = t[idx];
            ii[k] = i[idx];
            vv[k] = v[idx];
        }
        return new Samples(tt, ii, vv);
    }

    /** Waveform samples on a common time base: time, load current, load voltage. */
    record Samples(double[] timeS, double[] currentA, double[] voltageV) {
        WaveformSeries labelled(String label) {
            return new WaveformSeries(label, timeS, currentA, voltageV);
        }
    }
}
