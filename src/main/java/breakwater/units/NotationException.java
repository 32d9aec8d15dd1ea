package breakwater.units;

/** A value that cannot be read as a number of the expected quantity; the message says why. */
public final class NotationException extends Exception {
    public NotationException(String message) {
        super(message);
    }
}
