package breakwater.design;

/**
 * A request an engine cannot carry out as asked (a design margin that leaves no room, a spread it cannot
 * draw): the user's choice is what is wrong, not an input file. The message says what to ask instead;
 * the command line reports it as a usage error.
 */
public final class RequestRefused extends RuntimeException {
    public RequestRefused(String message) {
        super(message);
    }
}
