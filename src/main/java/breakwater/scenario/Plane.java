package breakwater.scenario;

/**
 * Power/ground plane capacitance at the board node, with its series resistance.
 * {@link #NONE} (capacitance 0) when the scenario has no {@code [plane]}.
 */
public record Plane(double capacitanceF, double resistanceOhms) {
    public static final Plane NONE = new Plane(0, 0);

    public Plane {
        if (!(capacitanceF >= 0) || !(resistanceOhms >= 0)) {
            throw new IllegalArgumentException("plane capacitance and resistance must be >= 0");
        }
    }

    public boolean isPresent() {
        return capacitanceF > 0;
    }
}
