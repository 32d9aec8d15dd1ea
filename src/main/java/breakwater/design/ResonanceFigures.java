package breakwater.design;

import breakwater.timedomain.ResonanceResponse;

/**
 * How hard a load can ring one anti-resonance, per ampere of ΔI.
 *
 * @param response         the network's steady-state responses at the resonance (sine, 50 % square),
 *                         cycles to 95 %, and the pole Q of the mode that rings there
 * @param ownStepPeakOhms  peak of that mode's own step response (its share of the network's step
 *                         response); NaN where no oscillating mode lies near the peak
 */
public record ResonanceFigures(ResonanceResponse response, double ownStepPeakOhms) {

    /** Whether an oscillating mode lies at this anti-resonance (else the figures are NaN). */
    public boolean rings() {
        return !Double.isNaN(ownStepPeakOhms);
    }
}
