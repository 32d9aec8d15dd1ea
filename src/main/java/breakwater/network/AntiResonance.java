package breakwater.network;

/**
 * A local maximum of |Z| in the band (a parallel resonance).
 *
 * @param frequencyHz   frequency of the maximum, refined to better than 0.1 %
 * @param impedanceOhms |Z| at the maximum
 * @param q             quality factor from the curvature of |Z| at the peak, see {@link ImpedanceAnalysis}
 */
public record AntiResonance(double frequencyHz, double impedanceOhms, double q) {
}
