package breakwater.cli;

/** A command-line problem found after parsing (unknown footprint name, ...): exit code 2. */
final class UsageException extends RuntimeException {
    UsageException(String message) {
        super(message);
    }
}
