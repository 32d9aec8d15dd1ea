package breakwater.scenario;

import java.time.Duration;
import java.util.Objects;

/** Search settings from {@code [solver]}; the command line may override both. */
public record SolverSettings(Duration timeLimit, long seed) {
    public static final SolverSettings DEFAULT = new SolverSettings(Duration.ofSeconds(30), 1);

    public SolverSettings {
        Objects.requireNonNull(timeLimit, "timeLimit");
        if (timeLimit.isNegative() || timeLimit.isZero()) {
            throw new IllegalArgumentException("time limit must be > 0");
        }
    }
}
