/**
 * The exact worst-case transient: the impedance in pole–residue form
 * ({@link breakwater.timedomain.PoleResidueModel}, poles as Newton-polished zeros of the admittance,
 * self-checked against the network), the worst droop and overshoot with ideal edges (exact integration
 * between zero crossings) and with a slew limit (a chain linear program solved exactly by
 * {@code ChainDp}), the load patterns that reach them, their waveforms, and how hard
 * a load can ring each anti-resonance. All figures are per ampere of load step.
 *
 * <p>May use the packages before it ({@code units} … {@code network}); Commons Math is allowed here.
 *
 * <p>Read: {@code docs/worst-case.md}.
 */
package breakwater.timedomain;
