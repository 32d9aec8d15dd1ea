package breakwater.report.export;

/**
 * The breakpoints of a piecewise-linear source with strictly increasing times, as SPICE requires.
 * A load pattern's ideal jump is two breakpoints at one time (and breakpoints within δ₀ = 1e-4 of the fastest
 * period of the first of a group count as one time); here the k values at one time t are
 * spread evenly over (k − 1)·δ centred on t (so the charge the load draws is unchanged to first order),
 * or starting at t when t is the first time. δ is tiny: far below the fastest mode's period, and at most
 * half the smallest gap between distinct times divided by k, so no breakpoint passes another.
 *
 * @param timesS      strictly increasing times, s
 * @param valuesA     the source's value at each time, A
 * @param separationS δ, the time between the breakpoints of a jump; 0 when there was no jump
 * @param jumps       how many jumps were separated
 */
record PwlSchedule(double[] timesS, double[] valuesA, double separationS, int jumps) {

    /** δ as a share of the fastest mode's period. */
    static final double SEPARATION_PER_PERIOD = 1e-4;

    PwlSchedule {
        timesS = timesS.clone();
        valuesA = valuesA.clone();
        if (timesS.length != valuesA.length || timesS.length == 0) {
            throw new IllegalArgumentException("a PWL source needs equally many times and values, at least one");
        }
        for (int i = 1; i < timesS.length; i++) {
            if (!(timesS[i] > timesS[i - 1])) {
                throw new IllegalArgumentException("PWL times must increase strictly, at index " + i);
            }
        }
    }

    /**
     * From breakpoints whose times do not decrease (equal times are a jump).
     *
     * @param shortestPeriodS the fastest mode's period, s
     */
    static PwlSchedule of(double[] t, double[] v, double shortestPeriodS) {
        int n = t.length;
        if (v.length != n || n == 0) {
            throw new IllegalArgumentException("equally many times and values expected, at least one");
        }
        for (int i = 1; i < n; i++) {
            if (t[i] < t[i - 1] || !Double.isFinite(t[i])) {
                throw new IllegalArgumentException("breakpoint times must not decrease, at index " + i);
            }
        }
        // breakpoints closer than δ₀ to the first of their group are one instant: a simulator cannot step
        // between them (times a rounding apart would force a step of 1e-20 s), and moving a breakpoint by
        // less than δ₀ changes the load's charge by less than ΔI·δ₀, far below anything the rail responds to
        double delta0 = SEPARATION_PER_PERIOD * shortestPeriodS;
        double[] at = new double[n];
        double minGap = Double.POSITIVE_INFINITY;
        int largestGroup = 1;
        int group = 1;
        at[0] = t[0];
        for (int i = 1; i < n; i++) {
            if (t[i] - at[i - 1] > delta0) {
                at[i] = t[i];
                minGap = Math.min(minGap, at[i] - at[i - 1]);
                group = 1;
            } else {
                at[i] = at[i - 1];
                group++;
                largestGroup = Math.max(largestGroup, group);
            }
        }
        if (largestGroup == 1) {
            return new PwlSchedule(t, v, 0.0, 0);
        }
        double delta = delta0;
        if (Double.isFinite(minGap)) {
            delta = Math.min(delta, 0.5 * minGap / largestGroup);
        }
        double[] out = new double[n];
        int jumps = 0;
        int i = 0;
        while (i < n) {
            int j = i;
            while (j + 1 < n && at[j + 1] == at[i]) {
                j++;
            }
            int k = j - i + 1;
            double start = i == 0 ? at[i] : at[i] - 0.5 * (k - 1) * delta;
            for (int m = 0; m < k; m++) {
                out[i + m] = start + m * delta;
            }
            if (k > 1) {
                jumps++;
            }
            i = j + 1;
        }
        return new PwlSchedule(out, v, delta, jumps);
    }

    int size() {
        return timesS.length;
    }

    double time(int i) {
        return timesS[i];
    }

    double value(int i) {
        return valuesA[i];
    }
}
