package breakwater.report.chart;

/** Argument checks of the chart inputs: an {@link IllegalArgumentException} that says what is wrong. */
final class Checks {
    private Checks() {
    }

    static void require(boolean condition, String message) {
        if (!condition) {
            throw new IllegalArgumentException(message);
        }
    }
}
