package breakwater.cli;

import breakwater.design.Verdict;

/** Process exit codes (docs/file-contracts.md#exit-codes), shown in {@code --help}. */
public final class ExitCodes {
    /** Success: the bank meets the spec. */
    public static final int OK = 0;
    /** Ran, but no bank meets the spec (the closest one is still reported). */
    public static final int SPEC_NOT_MET = 1;
    /** Bad command line. */
    public static final int USAGE = 2;
    /** An input file is invalid. */
    public static final int INVALID_INPUT = 3;
    /** Reading or writing a file failed. */
    public static final int IO_ERROR = 4;
    /** A bug in Breakwater: the only case that prints a stack trace. */
    public static final int INTERNAL = 70;

    private ExitCodes() {
    }

    /** The exit code of a run with this verdict: the run as a whole meets the spec, or it does not. */
    static int of(Verdict verdict) {
        return verdict.meetsSpec() ? OK : SPEC_NOT_MET;
    }
}
