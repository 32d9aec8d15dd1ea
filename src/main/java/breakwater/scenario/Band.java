package breakwater.scenario;

/** The frequency band where flatness and the target impedance are judged; from &lt; to, both &gt; 0. */
public record Band(double fromHz, double toHz) {
    public Band {
        if (!(fromHz > 0) || !(toHz > fromHz) || !Double.isFinite(toHz)) {
            throw new IllegalArgumentException("band needs 0 < from < to, got " + fromHz + " .. " + toHz);
        }
    }

    public boolean contains(double fHz) {
        return fHz >= fromHz && fHz <= toHz;
    }
}
