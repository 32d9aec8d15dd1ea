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

    static void requireText(String s, String what) {
        require(s != null && !s.isBlank(), what + " is empty; it needs some text");
    }

    static void requireFinite(double[] values, String what) {
        for (int i = 0; i < values.length; i++) {
            require(Double.isFinite(values[i]), what + "[" + i + "] = " + values[i] + " is not finite");
        }
    }

    static void requirePositive(double[] values, String what) {
        for (int i = 0; i < values.length; i++) {
            require(values[i] > 0 && Double.isFinite(values[i]), what + "[" + i + "] = " + values[i]
                    + " must be positive and finite (it is drawn on a log axis)");
        }
    }

    static void requireAscending(double[] values, String what) {
        for (int i = 1; i < values.length; i++) {
            require(values[i] > values[i - 1], what + "[" + i + "] = " + values[i] + " does not exceed the value before it;"
                    + " values must ascend");
        }
    }
}
