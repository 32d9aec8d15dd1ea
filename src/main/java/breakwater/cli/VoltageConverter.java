package breakwater.cli;

import breakwater.units.EngineeringNotation;
import breakwater.units.NotationException;
import breakwater.units.Quantity;
import picocli.CommandLine;

/** Parses a voltage of at least 0 V in engineering notation ("1 mV", "0.5m", "1e-3"). */
final class VoltageConverter implements CommandLine.ITypeConverter<Double> {
    @Override
    public Double convert(String value) {
        double v;
        try {
            v = EngineeringNotation.parse(value, Quantity.VOLTAGE);
        } catch (NotationException e) {
            throw new CommandLine.TypeConversionException(e.getMessage());
        }
        if (!(v >= 0)) {
            throw new CommandLine.TypeConversionException("a margin must be at least 0 V, got '" + value + "'");
        }
        return v;
    }
}
