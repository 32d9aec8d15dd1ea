/**
 * The report's charts as SVG text: {@link breakwater.report.chart.ImpedanceChart} (|Z| against frequency
 * with the target, the band and markers), {@link breakwater.report.chart.WorstCaseChart} (a worst-case
 * load pattern with the voltage it causes and the limits, also used for the close-up near the worst
 * instant), {@link breakwater.report.chart.HistogramChart} and {@link breakwater.report.chart.FrontierChart}
 * (cost against worst excursion). Each takes one input record and returns one {@code <svg>} element.
 *
 * <p>{@code ChartStyle} holds what the charts share (size, colours, fonts, strokes, tick formats),
 * {@code Axes} the axes, and {@link breakwater.report.chart.SvgWriter} draws a chart into SVG. This is the
 * only package importing JFreeChart and JFreeSVG; no type of theirs appears in a public signature.
 *
 * <p>May use the packages before {@code report} ({@code units} … {@code optimize}), never {@code report}
 * itself: the input records ({@code ImpedancePlot}, {@code WaveformPlot}, …) and the axis format
 * {@link breakwater.report.chart.EngineeringFormat} live here, and {@code report} fills them.
 *
 * <p>Read: {@code docs/architecture.md} (the package order), {@code docs/file-contracts.md} (the report).
 */
package breakwater.report.chart;
