package breakwater.report;

import breakwater.report.chart.ImpedancePlot;
import breakwater.report.chart.ImpedanceSeries;
import breakwater.report.chart.WaveformPlot;
import breakwater.report.chart.WaveformSeries;
import breakwater.design.Evaluation;
import breakwater.timedomain.Waveform;

import java.util.List;

/**
 * Report changes for modes that show several banks at once: overlaid impedance curves and worst-case
 * waveforms on the report's main charts (old and new bank, one per footprint, ...).
 */
public final class Overlays {
    private Overlays() {
    }

    /** |Z| of {@code e} on its report grid, labelled. */
    public static ImpedanceSeries impedance(String label, Evaluation e) {
        return ReportBuilder.impedanceSeries(label, e);
    }

    /** A worst-case waveform, thinned for plotting (extremes kept), labelled. */
    public static WaveformSeries waveform(String label, Waveform w) {
        return ReportBuilder.waveformSeries(label, w);
    }

    /** The model with these curves on its impedance chart (target, band and markers kept). */
    public static ReportModel withImpedance(ReportModel m, List<ImpedanceSeries> series) {
        ImpedancePlot p = m.impedance();
        return new ReportModel(m.title(), m.subtitleLines(), m.verdict(), m.keyFigures(),
                new ImpedancePlot(series, p.targetOhm(), p.bandFromHz(), p.bandToHz(), p.markers()),
                m.worstCase(), m.bom(), m.resonances(), m.sections(), m.settings(), m.cautions());
    }

    /** The model with these waveforms on its worst-case chart (limits kept). */
    public static ReportModel withWorstCase(ReportModel m, List<WaveformSeries> series) {
        WaveformPlot p = m.worstCase();
        return new ReportModel(m.title(), m.subtitleLines(), m.verdict(), m.keyFigures(), m.impedance(),
                new WaveformPlot(series, p.nominalV(), p.lowerLimitV(), p.upperLimitV()), m.bom(),
                m.resonances(), m.sections(), m.settings(), m.cautions());
    }

    /** The model with a key figure added at the end. */
    public static ReportModel withKeyFigure(ReportModel m, ReportModel.KeyFigure figure) {
        List<ReportModel.KeyFigure> keys = new java.util.ArrayList<>(m.keyFigures());
        keys.add(figure);
        return new ReportModel(m.title(), m.subtitleLines(), m.verdict(), keys, m.impedance(), m.worstCase(),
                m.bom(), m.resonances(), m.sections(), m.settings(), m.cautions());
    }
}
