package breakwater.units;

import java.util.List;

/**
 * The physical quantities Breakwater reads and prints, each with the unit symbols it accepts.
 *
 * <p>Values are always held in coherent SI units (farad, henry, ohm, volt, ampere, hertz, second);
 * a {@link #FRACTION} is held as a plain ratio (3 % is 0.03).
 */
public enum Quantity {
    CAPACITANCE("capacitance", "F", List.of("F")),
    INDUCTANCE("inductance", "H", List.of("H")),
    RESISTANCE("resistance", "Ω", List.of("Ohm", "ohm", "Ohms", "ohms", "Ω", "\u2126", "R")),
    VOLTAGE("voltage", "V", List.of("V")),
    CURRENT("current", "A", List.of("A")),
    FREQUENCY("frequency", "Hz", List.of("Hz", "hz", "HZ")),
    TIME("time", "s", List.of("s", "sec")),
    /** A ratio, written either plain (0.03) or with a percent sign (3 %). */
    FRACTION("fraction", "%", List.of("%")),
    /** A dimensionless number such as a cost; accepts SI prefixes but no unit symbol. */
    PLAIN("number", "", List.of());

    private final String description;
    private final String symbol;
    private final List<String> symbols;

    Quantity(String description, String symbol, List<String> symbols) {
        this.description = description;
        this.symbol = symbol;
        this.symbols = symbols;
    }

    /** Words for messages, e.g. "capacitance". */
    public String description() {
        return description;
    }

    /** The symbol used when printing, e.g. "F", "Ω". */
    public String symbol() {
        return symbol;
    }

    /** Every symbol accepted on input for this quantity. */
    public List<String> acceptedSymbols() {
        return symbols;
    }
}
