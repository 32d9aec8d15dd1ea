package breakwater.report;

import breakwater.report.chart.ImpedanceMarker;
import breakwater.report.chart.ImpedancePlot;
import breakwater.report.chart.ImpedanceSeries;
import breakwater.report.chart.WaveformPlot;
import breakwater.report.chart.WaveformSeries;
import breakwater.report.ReportModel.Bom;
import breakwater.report.ReportModel.BomRow;
import breakwater.report.ReportModel.KeyFigure;
import breakwater.report.ReportModel.Section;
import breakwater.report.ReportModel.Table;
import breakwater.report.ReportModel.Tone;
import breakwater.report.ReportModel.Verdict;
import breakwater.report.chart.Frontier;
import breakwater.report.chart.FrontierChart;
import breakwater.report.chart.Histogram;
import breakwater.report.chart.HistogramChart;
import breakwater.report.chart.LabelledPoint;
import breakwater.report.chart.Limit;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Invented report data for tests and for looking at the page: a lumped rail (regulator inductance in
 * parallel with series-RLC capacitor branches) evaluated in closed form, and a synthetic resonant load
 * pattern integrated with a plain fixed-step scheme. Nothing here is a real design.
 */
public final class ExampleReport {
    static final double V_NOM = 0.95;
    static final double TOL = 0.03;
    static final double DELTA_I = 3.0;
    static final double Z_TARGET = V_NOM * TOL / DELTA_I; // 9.5 mΩ

    private ExampleReport() {
    }

    /** |Z| of R_reg + jωL_reg in parallel with series branches (R, L, C), each given as {r, l, c}. */
    static double parallelMagnitude(double f, double rReg, double lReg, double[][] branches) {
        double w = 2 * Math.PI * f;
        // admittance of the regulator path: 1 / (r + jx)
        double yr = rReg / (rReg * rReg + w * w * lReg * lReg);
        double yi = -w * lReg / (rReg * rReg + w * w * lReg * lReg);
        for (double[] b : branches) {
            double x = w * b[1] - 1 / (w * b[2]);
            double d = b[0] * b[0] + x * x;
            yr += b[0] / d;
            yi += -x / d;
        }
        return 1 / Math.hypot(yr, yi);
    }

    public static ImpedanceSeries curve(String label, double[][] branches) {
        int n = 400;
        double[] f = new double[n];
        double[] z = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = 1e3 * Math.pow(10, 6.0 * i / (n - 1)); // 1 kHz .. 1 GHz
            z[i] = parallelMagnitude(f[i], 0.3e-3, 18e-9, branches);
        }
        return new ImpedanceSeries(label, f, z);
    }

    public static final double[][] NEW_BANK = {
            {2e-3, 1.2e-9, 470e-6 / 2}, // bulk, two in parallel folded into one branch
            {2.5e-3 / 6, 0.45e-9 / 6, 6 * 10e-6},
            {6e-3 / 12, 0.35e-9 / 12, 12 * 1e-6},
            {20e-3 / 16, 0.3e-9 / 16, 16 * 100e-9},
            {0.3e-3, 25e-12, 150e-9}}; // die
    static final double[][] OLD_BANK = {
            {2e-3, 1.2e-9, 470e-6},
            {2.5e-3 / 3, 0.45e-9 / 3, 3 * 10e-6},
            {20e-3 / 8, 0.3e-9 / 8, 8 * 100e-9},
            {0.3e-3, 25e-12, 150e-9}};

    /** A tank driven at its resonance for a few cycles, then the deepest droop at the end. */
    static WaveformSeries waveform(String label, double l, double c, double r, double iMin, double iMax, int cycles) {
        double f0 = 1 / (2 * Math.PI * Math.sqrt(l * c));
        double half = 0.5 / f0;
        double tEnd = (cycles + 0.5) * 2 * half + 3 * half;
        int n = 3000;
        double dt = tEnd / n;
        double[] t = new double[n + 1];
        double[] i = new double[n + 1];
        double[] v = new double[n + 1];
        double iL = iMin;
        double vc = -r * 0; // deviation of the capacitor voltage from the operating point
        double start = 1.5 * half;
        for (int k = 0; k <= n; k++) {
            double tk = k * dt;
            double load = iMin;
            if (tk >= start && tk < start + (2 * cycles + 1) * half) {
                load = ((int) Math.floor((tk - start) / half)) % 2 == 0 ? iMax : iMin;
            }
            double ic = iL - load;
            double u = vc + r * ic;
            t[k] = tk;
            i[k] = load;
            v[k] = V_NOM + u;
            // semi-implicit Euler on L diL/dt = -u, C dvc/dt = ic (deviations from the operating point)
            iL += dt * (-u) / l;
            vc += dt * (iL - load) / c;
        }
        return new WaveformSeries(label, t, i, v);
    }

    /** Local maxima of a curve inside [fromHz, toHz], labelled with their frequency. */
    static List<ImpedanceMarker> peaks(ImpedanceSeries s, double fromHz, double toHz) {
        double[] f = s.frequencyHz();
        double[] z = s.impedanceOhm();
        List<ImpedanceMarker> out = new ArrayList<>();
        for (int i = 1; i + 1 < f.length; i++) {
            if (z[i] > z[i - 1] && z[i] >= z[i + 1] && f[i] >= fromHz && f[i] <= toHz) {
                out.add(new ImpedanceMarker(breakwater.units.EngineeringNotation.format(f[i], breakwater.units.Quantity.FREQUENCY),
                        f[i], z[i]));
            }
        }
        return out;
    }

    static ReportModel model() {
        ImpedanceSeries fresh = curve("new bank (48 parts)", NEW_BANK);
        ImpedanceSeries old = curve("existing bank (16 parts)", OLD_BANK);
        List<ImpedanceMarker> markers = peaks(fresh, 10e3, 150e6);
        ImpedancePlot z = new ImpedancePlot(List.of(fresh, old), Z_TARGET, 10e3, 150e6, markers);
        WaveformSeries w = waveform("worst-case pattern, new bank", 0.1e-9, 20e-6, 0.8e-3, 3.0, 6.0, 4);
        WaveformPlot wp = new WaveformPlot(List.of(w), V_NOM, V_NOM * (1 - TOL), V_NOM * (1 + TOL));
        Bom bom = new Bom(List.of(
                new BomRow("BULK-470U-7343", "polymer 470 µF 2.5 V", "7343", 2, 0.42, 0.84),
                new BomRow("C0805-10U-X5R", "MLCC 10 µF 6.3 V X5R", "0805", 6, 0.021, 0.126),
                new BomRow("C0402-1U-X5R", "MLCC 1 µF 6.3 V X5R", "0402", 12, 0.0065, 0.078),
                new BomRow("C0201-100N-X7R", "MLCC 100 nF 6.3 V X7R <demo & test>", "0201", 16, 0.0031, 0.0496)),
                1.4856, "USD", "includes placement 0.144 and line items 0.40");
        Table resonances = new Table("Anti-resonances inside the band, by frequency",
                List.of("frequency", "|Z|", "|Z| / Z_t", "Q", "step peak", "sine response", "square response",
                        "cycles to 95 %"),
                markers.stream().map(m -> List.of(m.label(),
                        breakwater.units.EngineeringNotation.format(m.impedanceOhm(), breakwater.units.Quantity.RESISTANCE),
                        String.format(java.util.Locale.ROOT, "%.2f", m.impedanceOhm() / Z_TARGET),
                        "3.1", "11.0 mV", "30.8 mV", "39.2 mV", "3.6")).toList());
        Random rnd = new Random(7);
        double[] mc = new double[2000];
        for (int k = 0; k < mc.length; k++) {
            mc[k] = 0.0215 + 0.0018 * rnd.nextGaussian();
        }
        String hist = HistogramChart.svg(new Histogram("worst droop", "V", mc, 40,
                List.of(new Limit("allowed droop 28.5 mV", 0.0285))));
        double[] cost = new double[120];
        double[] exc = new double[120];
        for (int k = 0; k < cost.length; k++) {
            cost[k] = 0.6 + 1.6 * rnd.nextDouble();
            exc[k] = 0.018 + 0.012 / (cost[k] - 0.35) * (0.6 + 0.8 * rnd.nextDouble());
        }
        double[] chosen = FrontierChart.nonDominated(cost, exc).stream().filter(p -> p[1] < 0.0285).findFirst().orElseThrow();
        String frontier = FrontierChart.svg(new Frontier("cost per board", "USD", "worst excursion", "V",
                cost, exc, List.of(new Limit("allowed 28.5 mV", 0.0285)),
                List.of(new LabelledPoint("cheapest bank within the limit", chosen[0], chosen[1]))));
        List<Section> sections = new ArrayList<>();
        sections.add(Section.text("Tolerance spread",
                        "2000 invented samples of the worst droop with part values drawn inside their tolerances.")
                .withChart(hist));
        sections.add(Section.text("Cost against worst excursion",
                        "Every evaluated bank; the staircase joins those no cheaper bank beats.")
                .withChart(frontier)
                .withTable(new Table("Frontier", List.of("cost (USD)", "worst excursion", "parts"),
                        List.of(List.of("0.91", "31.2 mV", "22"), List.of("1.49", "24.6 mV", "36")))));
        Table settings = new Table("", List.of("setting", "value"), List.of(
                List.of("seed", "1"), List.of("time limit", "30 s"), List.of("evaluations", "184 220"),
                List.of("solver time", "29.8 s"), List.of("Breakwater", "0.1.0-SNAPSHOT"), List.of("Java", "21")));
        return new ReportModel("Survey-drone flight computer, 0.95 V core (invented example)",
                List.of("Rail 0.95 V ± 3 % (0.9215 .. 0.9785 V), load 3 .. 6 A (ΔI 3 A), ideal edges",
                        "Target Z_t = 9.5 mΩ; band 10 kHz – 150 MHz; footprint two-via"),
                new Verdict(true, "Meets the spec", List.of(
                        "worst droop 24.6 mV stays inside the 28.5 mV allowed (margin 3.9 mV)",
                        "worst overshoot 22.1 mV stays inside the 28.5 mV allowed")),
                List.of(new KeyFigure("worst droop", "24.6 mV"), new KeyFigure("worst overshoot", "22.1 mV"),
                        new KeyFigure("min voltage", "0.9254 V"), new KeyFigure("max voltage", "0.9721 V"),
                        new KeyFigure("margin", "3.9 mV", Tone.GOOD), new KeyFigure("worst-case ratio", "2.59"),
                        new KeyFigure("peak |Z|", "8.3 mΩ at 62 MHz"), new KeyFigure("flatness", "4.8 dB"),
                        new KeyFigure("cost", "1.49 USD"), new KeyFigure("parts", "36 (4 distinct)")),
                z, wp, bom, resonances, sections, settings, List.of(ReportModel.STANDARD_CAUTION,
                        "Values in this example are invented."));
    }
}
