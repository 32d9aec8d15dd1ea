/**
 * The judged rail in open file formats, for other tools: {@link breakwater.report.export.SpiceDeck} writes
 * two SPICE3 decks of the lumped network (the rail as a subcircuit with the port {@code load}) that replay
 * the worst-case droop and overshoot patterns as piecewise-linear loads, with a transient and an AC
 * analysis; {@link breakwater.report.export.TouchstoneFile} writes the impedance at the load as a one-port
 * Touchstone 1.1 file on the points of impedance.csv.
 *
 * <p>May use the packages before {@code report} ({@code units} … {@code optimize}), never {@code report}
 * itself: {@code report.RailExports} writes these files into the output folder.
 *
 * <p>Read: {@code docs/file-contracts.md} (the output files), {@code docs/network-model.md} (the network the
 * decks spell out).
 */
package breakwater.report.export;
