package breakwater.scenario;

/**
 * The regulator's output impedance above its loop bandwidth: R + sL to AC ground.
 * At least one of the two must be &gt; 0 (an ideal source needs no capacitors).
 */
public record Regulator(double resistanceOhms, double inductanceH) {
    public Regulator {
        if (!(resistanceOhms >= 0) || !(inductanceH >= 0)) {
            throw new IllegalArgumentException("regulator resistance and inductance must be >= 0");
        }
        if (resistanceOhms == 0 && inductanceH == 0) {
            throw new IllegalArgumentException("regulator needs a resistance or an inductance > 0");
        }
    }
}
