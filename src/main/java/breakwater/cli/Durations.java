package breakwater.cli;

import picocli.CommandLine;

import java.time.Duration;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Durations on the command line: {@code 30s}, {@code 30 s}, {@code 2min}, {@code 500ms}, {@code 1h}, {@code 45}. */
final class Durations {
    private static final Pattern FORM = Pattern.compile("\\s*([0-9]*\\.?[0-9]+)\\s*(ms|s|sec|min|m|h)?\\s*");

    private Durations() {
    }

    static Duration parse(String text) {
        Matcher m = FORM.matcher(text.toLowerCase(Locale.ROOT));
        if (!m.matches()) {
            throw new IllegalArgumentException("'" + text + "' is not a duration; write e.g. 30s, 2min or 500ms");
        }
        double v = Double.parseDouble(m.group(1));
        String unit = m.group(2) == null ? "s" : m.group(2);
        double seconds = switch (unit) {
            case "ms" -> v / 1000;
            case "min", "m" -> v * 60;
            case "h" -> v * 3600;
            default -> v;
        };
        if (!(seconds > 0)) {
            throw new IllegalArgumentException("a duration must be > 0, got '" + text + "'");
        }
        return Duration.ofNanos(Math.round(seconds * 1e9));
    }

    static final class Converter implements CommandLine.ITypeConverter<Duration> {
        @Override
        public Duration convert(String value) {
            try {
                return parse(value);
            } catch (IllegalArgumentException e) {
                throw new CommandLine.TypeConversionException(e.getMessage());
            }
        }
    }
}
