package breakwater.units;

import java.util.Map;
import java.util.Optional;

/**
 * What a part of one case code usually holds, for the warned ranges (docs/file-contracts.md#plausible-values):
 * the most capacitance a part of that size is made with and the least ESL its geometry allows. A value
 * beyond either is not refused (a case code is only a label; the model uses the values), but warned
 * about where it is written: 1 F in an 0201 is no real part, and is more likely a lost unit prefix or a
 * wrong case code.
 *
 * <p>The bounds are generous common practice, written from memory: a few times the largest ceramic parts
 * of each EIA size and about a third of the smallest ESL of a conventional part of that size, so that
 * no catalog of real parts should meet them. Reverse-geometry sizes (0204, 0306, 0508, 0612, wide
 * terminations on the long side) have a lower ESL; moulded tantalum and polymer parts (letter codes,
 * and the metric moulded codes 3216, 3528, 6032, 7343, 7360) hold the most. A case code not listed
 * gets no case check.
 *
 * @param code           the case code
 * @param maxCapacitanceF the most capacitance a part of this case usually holds, F
 * @param minEslH        the least ESL a part of this case usually has, H
 */
public record CaseRange(String code, double maxCapacitanceF, double minEslH) {

    private static final Map<String, CaseRange> EIA = Map.ofEntries(
            entry("0201", 10e-6, 40e-12),
            entry("0402", 47e-6, 50e-12),
            entry("0603", 220e-6, 70e-12),
            entry("0805", 470e-6, 80e-12),
            entry("1206", 1e-3, 100e-12),
            entry("1210", 1e-3, 100e-12),
            entry("1812", 1e-3, 100e-12),
            entry("2220", 1e-3, 100e-12),
            entry("2225", 1e-3, 100e-12),
            // reverse geometry: terminations on the long sides, a short current loop
            entry("0204", 10e-6, 20e-12),
            entry("0306", 47e-6, 20e-12),
            entry("0508", 100e-6, 20e-12),
            entry("0612", 220e-6, 20e-12),
            // moulded parts by their metric codes
            entry("3216", 10e-3, 100e-12),
            entry("3528", 10e-3, 100e-12),
            entry("6032", 10e-3, 100e-12),
            entry("7343", 10e-3, 100e-12),
            entry("7360", 10e-3, 100e-12));

    /** Moulded tantalum and polymer parts by their letter codes (A, B, C, D, E, V, X, ...). */
    private static final double MOULDED_MAX_F = 10e-3;
    private static final double MOULDED_MIN_ESL_H = 100e-12;

    private static Map.Entry<String, CaseRange> entry(String code, double maxF, double minEslH) {
        return Map.entry(code, new CaseRange(code, maxF, minEslH));
    }

    /** The usual range of {@code code}, or empty for a code not listed (no case check). */
    public static Optional<CaseRange> of(String code) {
        CaseRange r = EIA.get(code);
        if (r != null) {
            return Optional.of(r);
        }
        if (code.matches("[A-Z]{1,2}")) {
            return Optional.of(new CaseRange(code, MOULDED_MAX_F, MOULDED_MIN_ESL_H));
        }
        return Optional.empty();
    }

    /** The warning for a capacitance above {@link #maxCapacitanceF}, or empty. */
    public Optional<String> capacitanceWarning(String key, String written, double capacitanceF) {
        if (!(capacitanceF > maxCapacitanceF)) {
            return Optional.empty();
        }
        return Optional.of(key + " '" + written + "' is more than a case " + code + " part holds (up to about "
                + EngineeringNotation.format(maxCapacitanceF, Quantity.CAPACITANCE) + ", common practice): check the "
                + "unit prefix and the case code");
    }

    /** The warning for an ESL below {@link #minEslH}, or empty. */
    public Optional<String> eslWarning(String key, String written, double eslH) {
        if (!(eslH < minEslH)) {
            return Optional.empty();
        }
        return Optional.of(key + " '" + written + "' is far below what a case " + code + " part has (about "
                + EngineeringNotation.format(minEslH, Quantity.INDUCTANCE) + " at the least, common practice): check the "
                + "unit prefix; a low-inductance part (reverse geometry, several terminals) has a case code of its own");
    }
}
