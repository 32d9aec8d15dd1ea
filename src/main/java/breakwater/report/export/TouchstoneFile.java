package breakwater.report.export;

import breakwater.network.ImpedanceCurve;

import java.io.IOException;
import java.io.Writer;

/**
 * The impedance at the load as a one-port Touchstone file (version 1.1): {@code !} comment lines, the
 * option line {@code # Hz Z RI R 1} (frequency in hertz, Z-parameters as real and imaginary parts,
 * reference resistance 1 Ω, so the numbers are ohms), then one line per frequency: f, Re Z, Im Z. The
 * frequencies are exactly those of impedance.csv.
 */
public final class TouchstoneFile {
    public static final String FILE = "impedance.s1p";
    /** The option line. */
    static final String OPTIONS = "# Hz Z RI R 1";

    private TouchstoneFile() {
    }

    public static void write(ExportedRail r, Writer w) throws IOException {
        ImpedanceCurve curve = r.evaluation().curve();
        comment(w, "Breakwater: impedance Z(f) at the load node of the rail, a one-port (Touchstone 1.1, Z-parameters).");
        comment(w, "Computed from the lumped model, not measured: same frequencies and values as impedance.csv.");
        comment(w, "Rail: " + r.railName());
        comment(w, "Scenario: " + r.scenario().source() + ", with " + r.footprintText());
        comment(w, "Bank: " + r.bankText());
        comment(w, "Written by Breakwater " + r.version());
        comment(w, "Caution: a model is not a measurement. Verify the design on hardware; respect part ratings");
        comment(w, "(voltage, temperature, ripple current, DC bias) and the local codes.");
        comment(w, "Columns: frequency in Hz, Re Z and Im Z in ohms (reference resistance 1 ohm).");
        w.write(OPTIONS);
        w.write('\n');
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < curve.size(); i++) {
            b.setLength(0);
            b.append(SpiceNetlist.number(curve.frequencyHz(i))).append(' ')
                    .append(SpiceNetlist.number(curve.realOhms()[i])).append(' ')
                    .append(SpiceNetlist.number(curve.imagOhms()[i])).append('\n');
            w.write(b.toString());
        }
    }

    private static void comment(Writer w, String text) throws IOException {
        w.write(("! " + Ascii.of(text)).stripTrailing());
        w.write('\n');
    }
}
