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
            "70:internal error (a bug: please report it with the stack trace)"})
public final class Main implements Runnable {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "a command is required (check, solve, ...)");
    }

    public static void main(String[] args) {
        System.exit(run(args, System.out, System.err));
    }

    /** Runs the command line in-process; returns the exit code. Used by tests too. */
    public static int run(String[] args, PrintStream out, PrintStream err) {
        CommandLine cl = new CommandLine(new Main());
        cl.setOut(new PrintWriter(out, true, StandardCharsets.UTF_8));
        cl.setErr(new PrintWriter(err, true, StandardCharsets.UTF_8));
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
            c.getErr().println("breakwater: " + ex.getMessage());
            CommandLine.UnmatchedArgumentException.printSuggestions(ex, c.getErr());
            c.getErr().println("Try 'breakwater " + (c == cl ? "" : c.getCommandName() + " ") + "--help'.");
            c.getErr().flush();
            return ExitCodes.USAGE;
        });
        cl.setExecutionExceptionHandler((ex, c, parseResult) -> {
            PrintWriter e = c.getErr();
            int code = exitCodeFor(ex);
            if (code == ExitCodes.INVALID_INPUT && ex instanceof InputException ie) {
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
                e.println("breakwater: internal error — this is a bug; please report it with the trace below.");
                ex.printStackTrace(e);
            }
            e.flush();
            return code;
        });
        return cl.execute(args);
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
