package breakwater.scenario;

/**
 * The series path from the board node to the load node through the package (R + sL).
 * {@link #NONE} when the scenario has no {@code [package]}: then the load node is the board node.
 */
public record PackagePath(boolean present, double resistanceOhms, double inductanceH) {
    public static final PackagePath NONE = new PackagePath(false, 0, 0);

    public PackagePath {
        if (!(resistanceOhms >= 0) || !(inductanceH >= 0)) {
            throw new IllegalArgumentException("package resistance and inductance must be >= 0");
        }
    }

    public static PackagePath of(double resistanceOhms, double inductanceH) {
        return new PackagePath(true, resistanceOhms, inductanceH);
    }
}
