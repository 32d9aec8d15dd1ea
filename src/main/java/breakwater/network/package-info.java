/**
 * The lumped small-signal circuit seen from the load and its impedance:
 * {@link breakwater.network.PowerNetwork} (admittances summed, DC handled explicitly),
 * {@link breakwater.network.NetworkBuilder} (scenario and bank to circuit), the fast per-part engine
 * {@link breakwater.network.ImpedanceEngine} for the solver, and the flatness analysis
 * {@link breakwater.network.ImpedanceAnalysis} (peak, flatness, anti-resonances refined by Brent's method,
 * Q from the peak's curvature).
 *
 * <p>May use {@code units}, {@code diagnostic}, {@code catalog} and {@code scenario}; Commons Math is allowed
 * here.
 *
 * <p>Read: {@code docs/network-model.md}.
 */
package breakwater.network;
