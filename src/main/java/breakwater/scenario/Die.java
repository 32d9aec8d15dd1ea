package breakwater.scenario;

/**
 * On-die capacitance at the load node with its series resistance.
 * {@link #NONE} (capacitance 0) when the scenario has no {@code [die]}.
 */
public record Die(double capacitanceF, double resistanceOhms) {
    public static final Die NONE = new Die(0, 0);

    public Die {
        if (!(capacitanceF >= 0) || !(resistanceOhms >= 0)) {
            throw new IllegalArgumentException("die capacitance and resistance must be >= 0");
        }
    }

    public boolean isPresent() {
        return capacitanceF > 0;
    }
}
