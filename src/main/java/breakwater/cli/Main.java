package breakwater.cli;

import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.InputException;
import breakwater.diagnostic.Suggestions;
import picocli.CommandLine;
import picocli.CommandLine.Command;

import java.io.IOException;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/** Entry point of the {@code breakwater} command. */
@Command(name = "breakwater",
        mixinStandardHelpOptions = true,
        versionProvider = Main.Version.class,
        description = {
            "Chooses decoupling capacitors for a power rail by the exact worst-case transient any load",
            "pattern can cause, not by peak impedance alone.",
            "",
            "Caution: results come from a lumped model, not a measurement. Verify every design on",
            "hardware, and respect part ratings (voltage, temperature, ripple current) and local codes."},
        subcommands = {SolveCommand.class, CheckCommand.class, TrimCommand.class, CompareCommand.class,
            FrontierCommand.class, CommandLine.HelpCommand.class},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:success; the bank meets the spec",
            "1:ran, but the bank does not meet the spec (closest bank still written)",
            "2:bad command line",
            "3:invalid input file (every problem is listed as file:line:column)",
            "4:I/O error reading or writing a file",
            "70:internal error (a bug: please report it; --debug or BREAKWATER_DEBUG=1 shows the trace)"})
public final class Main implements Runnable {

    /** The environment variable that, set to 1 (or true), prints the trace of an internal error. */
    static final String DEBUG_ENV = "BREAKWATER_DEBUG";

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @CommandLine.Option(names = "--debug", scope = CommandLine.ScopeType.INHERIT,
            description = "On an internal error (exit 70), print the Java stack trace as well (or set "
                    + DEBUG_ENV + "=1).")
    boolean debug;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "a command is required (check, solve, ...)");
    }

    /**
     * Heap kept back for the last words: released before an internal error is reported, so that the
     * report of an out-of-memory error has room to be written (common practice for a program's last line).
     */
    private static volatile byte[] reserve = new byte[512 * 1024];

    /**
     * When this program started (the Java virtual machine's start), for a time limit that counts from
     * there; empty when run in-process (tests).
     */
    private static volatile java.util.Optional<java.time.Instant> programStart = java.util.Optional.empty();

    static java.util.Optional<java.time.Instant> programStart() {
        return programStart;
    }

    public static void main(String[] args) {
        // the Java virtual machine's own start: the launcher script execs java in its own process, so the
        // process's start would also count the script's work before it (building the jar on a first run)
        programStart = java.util.Optional.of(java.time.Instant.ofEpochMilli(
                java.lang.management.ManagementFactory.getRuntimeMXBean().getStartTime()));
        boolean debug = debugAsked(args, System.getenv(DEBUG_ENV));
        // a throwable on a thread of our own (progress, a solver) ends the run like one on the main thread;
        // the writer is made now, while there is memory for it
        PrintWriter lastWords = new PrintWriter(System.err, true, StandardCharsets.UTF_8);
        // a worker of a parallel stream or of the solvers that dies (out of memory, say) ends the process:
        // whatever the handler itself meets, the halt follows, so nothing waits for the dead worker's part.
        // Halting loads the JVM's shutdown class on first use, which needs heap: load it now (a hook added
        // and removed), or a halt out of memory fails inside the handler and the process lives on
        Thread warm = new Thread(() -> { });
        Runtime.getRuntime().addShutdownHook(warm);
        Runtime.getRuntime().removeShutdownHook(warm);
        Thread.setDefaultUncaughtExceptionHandler((thread, ex) -> {
            try {
                internalError(ex, lastWords, debug);
            } finally {
                lastResort(ex);
                Runtime.getRuntime().halt(ExitCodes.INTERNAL);
            }
        });
        // the out-of-memory line as bytes, and a stream that writes them with no heap: the last resort
        try {
            java.io.FileOutputStream raw = new java.io.FileOutputStream(java.io.FileDescriptor.err);
            raw.write(new byte[0]); // links the write path now
            rawErr = raw;
            String trace = debug ? "" : " --debug or " + DEBUG_ENV + "=1 shows the trace.";
            outOfMemoryBytes = (OUT_OF_MEMORY_LINE + trace + System.lineSeparator()).getBytes(StandardCharsets.UTF_8);
            internalErrorBytes = ("breakwater: internal error (a bug in breakwater, not in your input); please report it "
                    + "with the command you ran." + trace + System.lineSeparator()).getBytes(StandardCharsets.UTF_8);
        } catch (IOException | RuntimeException unusable) {
            rawErr = null; // then the writer alone
        }
        // every call on the way to the last words is linked now: linking a call for the first time needs
        // heap, and out of memory it fails (the line was lost so, now and then, before this)
        try {
            if (rawErr != null) {
                rawErr.write(new byte[0]);
                rawErr.flush();
            }
            outOfMemory(WARM_UP);
            internalError(WARM_UP, lastWords, debug);
            say(WARM_UP, lastWords, debug);
            lastResort(WARM_UP);
            Thread.onSpinWait();
            System.nanoTime();
        } catch (IOException | RuntimeException unusable) {
            // the writer alone, as before
        }
        oneProcess = true;
        int code = run(args, System.out, System.err);
        if (code == ExitCodes.INTERNAL) {
            lastResort(lastError);
            // no shutdown hook or lingering worker may hold the end back
            System.out.flush();
            System.err.flush();
            Runtime.getRuntime().halt(code);
        }
        System.exit(code);
    }

    /**
     * Set in {@link #main}: then the last words of an internal error are said once per process, however
     * many threads meet an error at once (workers of a parallel stream running out of memory together).
     */
    private static volatile boolean oneProcess;
    private static final Object LAST_WORDS = new Object();
    /** Standard error as a plain file stream, and the out-of-memory line as bytes, made in {@link #main}. */
    private static volatile java.io.OutputStream rawErr;
    private static volatile byte[] outOfMemoryBytes;
    private static volatile byte[] internalErrorBytes;
    /** Passed once at the start to link the calls of the last words; each returns at once for it. */
    private static final Throwable WARM_UP = new Error("warm-up", null, false, false) { };

    /** The error last met by {@link #internalError}, for the last resort; null before any. */
    private static volatile Throwable lastError;

    /**
     * Before the process ends on an internal error: when no line could be said (or the exit code came
     * without one), the line made at the start, written with no heap; nothing when one was said.
     */
    private static void lastResort(Throwable ex) {
        if (ex == WARM_UP) {
            return;
        }
        try {
            synchronized (LAST_WORDS) {
                if (lastWordsSaid || rawErr == null) {
                    return;
                }
                rawErr.write(ex == null || outOfMemory(ex) ? outOfMemoryBytes : internalErrorBytes);
                rawErr.flush();
                lastWordsSaid = true;
            }
        } catch (Throwable nothing) {
            // the exit code still tells
        }
    }
    private static boolean lastWordsSaid;

    /** The out-of-memory line when even its own words find no room (no concatenation at that moment). */
    private static final String OUT_OF_MEMORY_LINE = "breakwater: internal error: the Java heap ran out of memory; "
            + "please report it with the command you ran; more heap may get round it (BREAKWATER_JAVA_OPTS=-Xmx4g).";

    /** Runs the command line in-process; returns the exit code. Used by tests too. */
    public static int run(String[] args, PrintStream out, PrintStream err) {
        return run(args, out, err, System.getenv(DEBUG_ENV));
    }

    /**
     * As {@link #run(String[], PrintStream, PrintStream)}, with the value of {@value #DEBUG_ENV} given
     * ({@code null} when unset). No throwable leaves: whatever escapes the command, out-of-memory and
     * stack overflow included, is exit 70 with one line asking for a report.
     */
    static int run(String[] args, PrintStream out, PrintStream err, String debugEnv) {
        boolean debug = debugAsked(args, debugEnv);
        PrintWriter errWriter = new PrintWriter(err, true, StandardCharsets.UTF_8);
        try {
            return execute(args, out, errWriter, debug);
        } catch (Throwable ex) { // an Error escapes picocli's handlers: still ours, still one line
            return internalError(ex, errWriter, debug);
        }
    }

    /** {@code --debug} among the options (before a {@code --} that ends them), or the variable set. */
    static boolean debugAsked(String[] args, String debugEnv) {
        if (debugEnv != null && (debugEnv.strip().equals("1") || debugEnv.strip().equalsIgnoreCase("true"))) {
            return true;
        }
        for (String a : args) {
            if (a.equals("--")) {
                return false;
            }
            if (a.equals("--debug")) {
                return true;
            }
        }
        return false;
    }

    /**
     * The one line of an internal error (and the trace when asked for); returns exit code 70. Running
     * out of memory gets its own words, since more heap may be the way round it.
     */
    static int internalError(Throwable ex, PrintWriter e, boolean debug) {
        if (ex == WARM_UP) {
            return ExitCodes.INTERNAL;
        }
        reserve = null;
        lastError = ex;
        synchronized (LAST_WORDS) {
            if (oneProcess && lastWordsSaid) {
                return ExitCodes.INTERNAL;
            }
            // out of memory, the line itself may find no room at first: other threads that meet the error
            // wait at the lock above, so memory comes free; a few tries, then the exit code alone tells
            // (the wait spins: sleeping may itself need heap)
            boolean said = false;
            for (int attempt = 0; attempt < 50 && !(said = say(ex, e, debug)); attempt++) {
                long until = System.nanoTime() + 20_000_000L;
                while (System.nanoTime() < until) {
                    Thread.onSpinWait();
                }
            }
            lastWordsSaid = said;
        }
        return ExitCodes.INTERNAL;
    }

    /**
     * Whether {@code ex} is the heap running out, itself or as the cause of another error (a class that
     * could not be initialised, a call site that could not be linked, out of memory).
     */
    private static boolean outOfMemory(Throwable ex) {
        Throwable t = ex;
        for (int depth = 0; t != null && depth < 8; depth++, t = t.getCause()) {
            if (t instanceof OutOfMemoryError) {
                return true;
            }
        }
        return false;
    }

    /** Prints the line (and the trace when asked); false when it could not be printed. */
    private static boolean say(Throwable ex, PrintWriter e, boolean debug) {
        if (ex == WARM_UP) {
            return true;
        }
        try {
            if (outOfMemory(ex) && rawErr != null) {
                // a process of its own: the bytes made at the start, written with no heap at all
                e.flush();
                rawErr.write(outOfMemoryBytes);
                rawErr.flush();
                if (debug) {
                    try {
                        ex.printStackTrace(e);
                        e.flush();
                    } catch (Throwable noRoom) {
                        // the line is out; the trace needed more heap than there was
                    }
                }
                return true;
            }
            if (outOfMemory(ex)) {
                // built with a StringBuilder: a first string concatenation would link its call site, and
                // that needs heap too
                String line;
                try {
                    line = new StringBuilder("breakwater: internal error: the Java heap ran out of memory (")
                            .append(ex.getMessage()).append("); please report it with the command you ran; more heap ")
                            .append("may get round it (BREAKWATER_JAVA_OPTS=-Xmx4g)")
                            .append(debug ? "" : "; --debug or BREAKWATER_DEBUG=1 shows the trace").append('.')
                            .toString();
                } catch (Throwable noRoom) {
                    line = OUT_OF_MEMORY_LINE;
                }
                e.println(line);
            } else {
                String what = ex.getClass().getSimpleName() + (ex.getMessage() == null ? "" : ": "
                        + firstLine(ex.getMessage()));
                e.println("breakwater: internal error (a bug in breakwater, not in your input): " + what
                        + "; please report it with the command you ran" + (debug ? " and the trace below"
                        : "; --debug or " + DEBUG_ENV + "=1 shows the trace") + ".");
            }
            if (debug) {
                ex.printStackTrace(e);
            }
            e.flush();
            return !e.checkError(); // a writer that failed underneath says so only here
        } catch (Throwable again) {
            try {
                if (outOfMemory(ex)) {
                    e.println(OUT_OF_MEMORY_LINE);
                    e.flush();
                    return true;
                }
            } catch (Throwable still) {
                // not now
            }
            return false;
        }
    }

    private static String firstLine(String s) {
        int nl = s.indexOf('\n');
        String line = nl < 0 ? s : s.substring(0, nl);
        return line.length() > 200 ? line.substring(0, 200) + " ..." : line;
    }

    private static int execute(String[] args, PrintStream out, PrintWriter errWriter, boolean debug) {
        CommandLine cl = new CommandLine(new Main());
        cl.setOut(new PrintWriter(out, true, StandardCharsets.UTF_8));
        cl.setErr(errWriter);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setUsageHelpWidth(110); // descriptions are written for this width; no re-wrapping
        // compare takes --footprints (plural); the shared --footprint stays parsable, for its helpful
        // refusal, but is not offered in compare's help
        CommandLine.Model.CommandSpec compare = cl.getSubcommands().get("compare").getCommandSpec();
        CommandLine.Model.OptionSpec single = compare.findOption("--footprint");
        compare.remove(single);
        compare.addOption(single.toBuilder().hidden(true).build());
        // every command advertises -V/--version (mixinStandardHelpOptions); each must answer it
        for (CommandLine sub : cl.getSubcommands().values()) {
            sub.getCommandSpec().versionProvider(new Version());
        }
        cl.setExitCodeExceptionMapper(Main::exitCodeFor);
        cl.setParameterExceptionHandler((ex, a) -> {
            CommandLine c = ex.getCommandLine();
            if (unknownCommand(ex, cl)) {
                return ExitCodes.USAGE;
            }
            c.getErr().println("breakwater: " + plainWords(ex.getMessage()));
            CommandLine.UnmatchedArgumentException.printSuggestions(ex, c.getErr());
            c.getErr().println("Try 'breakwater " + (c == cl ? "" : c.getCommandName() + " ") + "--help'.");
            c.getErr().flush();
            return ExitCodes.USAGE;
        });
        cl.setExecutionExceptionHandler((ex, c, parseResult) -> {
            PrintWriter e = c.getErr();
            int code = exitCodeFor(ex);
            if (code == ExitCodes.INVALID_INPUT && ex instanceof InputException found) {
                InputException ie = Inputs.placed(found);
                for (Diagnostic d : ie.diagnostics()) {
                    e.println(d.render());
                }
                e.println("breakwater: " + ie.diagnostics().size() + " problem"
                        + (ie.diagnostics().size() == 1 ? "" : "s") + " in the input; nothing was written.");
            } else if (code == ExitCodes.IO_ERROR) {
                e.println("breakwater: " + ioMessage(ex));
            } else if (code == ExitCodes.USAGE) {
                e.println("breakwater: " + ex.getMessage());
            } else {
                return internalError(ex, e, debug);
            }
            e.flush();
            return code;
        });
        return cl.execute(args);
    }

    /**
     * picocli's message without Java's type names: "'x' is not a long" reads "'x' is not a whole number"
     * (within the range Java keeps for it), "is not a double" reads "is not a number".
     */
    static String plainWords(String message) {
        return message.replaceAll("' is not an? (int|long|short|byte|Integer|Long)\\b", "' is not a whole number (or too large)")
                .replaceAll("' is not an? (double|float|Double|Float)\\b", "' is not a number");
    }

    /**
     * A first word that names no command: "unknown command 'x'", the closest command name if one is
     * near, and the list of commands. Returns false (and prints nothing) for any other usage error.
     */
    private static boolean unknownCommand(CommandLine.ParameterException ex, CommandLine top) {
        if (!(ex instanceof CommandLine.UnmatchedArgumentException u) || ex.getCommandLine() != top
                || u.getUnmatched().isEmpty() || u.getUnmatched().get(0).startsWith("-")) {
            return false;
        }
        String word = u.getUnmatched().get(0);
        PrintWriter err = top.getErr();
        err.println("breakwater: unknown command '" + word + "'."
                + Suggestions.closest(word, top.getSubcommands().keySet())
                        .map(s -> " Did you mean '" + s + "'?").orElse(""));
        err.println("The commands are " + String.join(", ", top.getSubcommands().keySet())
                + "; try 'breakwater --help'.");
        err.flush();
        return true;
    }

    static int exitCodeFor(Throwable ex) {
        if (ex instanceof InputException) {
            return ExitCodes.INVALID_INPUT;
        }
        if (ex instanceof UsageException || ex instanceof breakwater.design.RequestRefused) {
            return ExitCodes.USAGE;
        }
        if (ex instanceof IOException || ex instanceof UncheckedIOException) {
            return ExitCodes.IO_ERROR;
        }
        return ExitCodes.INTERNAL;
    }

    private static String ioMessage(Throwable ex) {
        Throwable t = ex instanceof UncheckedIOException u ? u.getCause() : ex;
        String kind = t.getClass().getSimpleName();
        String msg = t.getMessage() == null ? "" : t.getMessage();
        return switch (kind) {
            case "NoSuchFileException" -> "no such file: " + msg;
            case "AccessDeniedException" -> "permission denied: " + msg;
            case "FileAlreadyExistsException" -> "already exists: " + msg;
            case "NotDirectoryException" -> "not a folder: " + msg;
            default -> msg.isEmpty() ? kind : msg;
        };
    }

    /** Version from the jar manifest, or "development" when run from classes. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"breakwater " + (v == null ? "(development build)" : v)};
        }
    }
}
