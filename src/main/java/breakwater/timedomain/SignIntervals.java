package breakwater.timedomain;

/**
 * Collects the sign intervals of h reported by {@link ImpulseMarch}: the integral of max(h, 0) and of
 * max(−h, 0) and, when asked, the crossing times, from which the ideal-edge worst-case patterns follow
 * (docs/worst-case.md#ideal-edges): u(lag) = 1 where h(lag) &gt; 0 for the droop, where h(lag) &lt; 0 for the
 * overshoot.
 */
final class SignIntervals implements ImpulseMarch.Sink {
    /** ∫max(h, 0) dt over the intervals so far, Ω. */
    double positive;
    /** ∫max(−h, 0) dt over the intervals so far, Ω. */
    double negative;
    /** The droop with the direct term, set by {@link WorstCaseAnalyzer} once the march is done. */
    double droop;
    /** The overshoot with the direct term, set by {@link WorstCaseAnalyzer} once the march is done. */
    double overshoot;
    /** Whether h is positive on the first interval. */
    boolean firstPositive;
    /** Whether any interval was reported. */
    boolean any;
    /** Whether the crossing times are kept, for the patterns. */
    final boolean keepEnds;
    /** End of every interval, s (when kept). */
    final DoubleList ends;

    SignIntervals(boolean keepEnds) {
        this.keepEnds = keepEnds;
        this.ends = new DoubleList(keepEnds ? 64 : 0);
    }

    @Override
    public void interval(double startS, double endS, double integral, boolean pos) {
        if (!any) {
            firstPositive = pos;
            any = true;
        }
        if (pos) {
            positive += integral;
        } else {
            negative -= integral;
        }
        if (keepEnds) {
            ends.add(endS);
        }
    }

    /** u = 1 on the intervals of the wanted sign; {@code spike}: u(0) = 1 to collect D·δ. */
    LoadPattern pattern(boolean wantPositive, boolean spike) {
        DoubleList lags = new DoubleList(2 * ends.size() + 4);
        DoubleList vals = new DoubleList(2 * ends.size() + 4);
        if (!any) {
            lags.add(0);
            vals.add(spike ? 1 : 0);
            return new LoadPattern(lags.toArray(), vals.toArray());
        }
        boolean on = firstPositive == wantPositive;
        if (spike && !on) {
            lags.add(0);
            vals.add(1);
        }
        lags.add(0);
        vals.add(on ? 1 : 0);
        for (int i = 0; i < ends.size(); i++) {
            double t = ends.get(i);
            lags.add(t);
            vals.add(on ? 1 : 0);
            if (i < ends.size() - 1) {
                on = !on;
                lags.add(t);
                vals.add(on ? 1 : 0);
            }
        }
        return new LoadPattern(lags.toArray(), vals.toArray());
    }
}
