package breakwater.catalog;

import java.util.Objects;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * One capacitor type of a parts catalog, in SI units.
 *
 * <p>Optional catalog columns that were left empty are stored as {@code NaN} (ratings, tolerance) or
 * {@code -1} (max count) and read through the {@code Optional} accessors below.
 *
 * @param name              unique part name (the catalog's {@code part} column)
 * @param description       free text, "" if none
 * @param caseCode          EIA case code such as "0402", "" if none
 * @param dielectric        dielectric class such as "X7R", "C0G", "polymer", "" if none
 * @param capacitanceF      nominal capacitance, &gt; 0
 * @param esrOhms           equivalent series resistance, &ge; 0
 * @param eslH              the part's own equivalent series inductance, &gt; 0
 * @param mountInductanceH  inductance of pads, vias and planes to the part, &ge; 0
 * @param unitCost          price of one part, &ge; 0
 * @param voltageRatingV    rated voltage, NaN if not given
 * @param toleranceFraction capacitance tolerance (0.1 = ±10 %), NaN if not given
 * @param dcBiasRetention   share of capacitance left at the rail voltage, in (0, 1]; 1 if not given
 * @param maxCount          most parts of this type that may be placed, -1 if not given
 */
public record Part(
        String name,
        String description,
        String caseCode,
        String dielectric,
        double capacitanceF,
        double esrOhms,
        double eslH,
        double mountInductanceH,
        double unitCost,
        double voltageRatingV,
        double toleranceFraction,
        double dcBiasRetention,
        int maxCount) {

    public Part {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(caseCode, "caseCode");
        Objects.requireNonNull(dielectric, "dielectric");
        if (name.isBlank()) {
            throw new IllegalArgumentException("part name must not be blank");
        }
        if (!(capacitanceF > 0) || !Double.isFinite(capacitanceF)) {
            throw new IllegalArgumentException(name + ": capacitance must be > 0, got " + capacitanceF);
        }
        if (!(esrOhms >= 0) || !Double.isFinite(esrOhms)) {
            throw new IllegalArgumentException(name + ": ESR must be >= 0, got " + esrOhms);
        }
        if (!(eslH > 0) || !Double.isFinite(eslH)) {
            throw new IllegalArgumentException(name + ": ESL must be > 0, got " + eslH);
        }
        if (!(mountInductanceH >= 0) || !Double.isFinite(mountInductanceH)) {
            throw new IllegalArgumentException(name + ": mounting inductance must be >= 0, got " + mountInductanceH);
        }
        if (!(unitCost >= 0) || !Double.isFinite(unitCost)) {
            throw new IllegalArgumentException(name + ": cost must be >= 0, got " + unitCost);
        }
        if (!(dcBiasRetention > 0 && dcBiasRetention <= 1)) {
            throw new IllegalArgumentException(name + ": DC-bias retention must be in (0, 1], got " + dcBiasRetention);
        }
        if (!Double.isNaN(toleranceFraction) && !(toleranceFraction >= 0 && toleranceFraction <= 1)) {
            throw new IllegalArgumentException(name + ": tolerance must be in 0..100 %, got " + toleranceFraction);
        }
        if (maxCount < -1 || maxCount > BankEntry.MAX_COUNT) {
            throw new IllegalArgumentException(name + ": max count must be in 0 .. " + BankEntry.MAX_COUNT
                    + " or -1 for none");
        }
    }

    /** A part with only the required columns; handy in tests. */
    public static Part of(String name, double capacitanceF, double esrOhms, double eslH,
                          double mountInductanceH, double unitCost) {
        return new Part(name, "", "", "", capacitanceF, esrOhms, eslH, mountInductanceH, unitCost,
                Double.NaN, Double.NaN, 1.0, -1);
    }

    /** Capacitance used by the model: nominal × DC-bias retention (docs/network-model.md#dc-bias-retention). */
    public double effectiveCapacitanceF() {
        return capacitanceF * dcBiasRetention;
    }

    public OptionalDouble voltageRating() {
        return Double.isNaN(voltageRatingV) ? OptionalDouble.empty() : OptionalDouble.of(voltageRatingV);
    }

    public OptionalDouble tolerance() {
        return Double.isNaN(toleranceFraction) ? OptionalDouble.empty() : OptionalDouble.of(toleranceFraction);
    }

    public OptionalInt maxCountLimit() {
        return maxCount < 0 ? OptionalInt.empty() : OptionalInt.of(maxCount);
    }

    public Part withMountInductance(double newMountInductanceH) {
        return new Part(name, description, caseCode, dielectric, capacitanceF, esrOhms, eslH, newMountInductanceH,
                unitCost, voltageRatingV, toleranceFraction, dcBiasRetention, maxCount);
    }
}
