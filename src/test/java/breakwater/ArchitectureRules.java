package breakwater;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The dependency rules of docs/architecture.md, checked on Java source text: which {@code breakwater}
 * packages a package may use, and where each framework may appear. Both imports and fully-qualified
 * names in code count; comments, string literals, text blocks and character literals are ignored.
 *
 * <p>Kept apart from the test that walks {@code src/main/java}, so that the checker itself can be tested
 * on small sources in memory.
 */
final class ArchitectureRules {

    /**
     * One step of the package order. Packages of a later layer may use those of earlier layers. Within
     * a layer of {@code siblings} the packages are independent of each other; a layer that is not
     * siblings is one layer split into packages that may use each other (none today).
     */
    record Layer(List<String> packages, boolean siblings) {
        Layer {
            packages = List.copyOf(packages);
        }
    }

    /** The package order, earliest first (package names below {@code breakwater.}). */
    static final List<Layer> ORDER = List.of(
            new Layer(List.of("units", "diagnostic"), true),
            new Layer(List.of("catalog", "scenario"), true),
            new Layer(List.of("network"), true),
            new Layer(List.of("timedomain"), true),
            new Layer(List.of("design"), true),
            new Layer(List.of("optimize"), true),
            new Layer(List.of("report.chart", "report.export"), true),
            new Layer(List.of("report"), true),
            new Layer(List.of("cli"), true));

    /** A framework: the package prefix that marks its use, and the packages allowed to use it. */
    record Framework(String name, String prefix, Set<String> allowedIn) {
        Framework {
            allowedIn = Set.copyOf(allowedIn);
        }
    }

    static final List<Framework> FRAMEWORKS = List.of(
            new Framework("Timefold Solver", "ai.timefold", Set.of("optimize")),
            new Framework("picocli", "picocli", Set.of("cli")),
            new Framework("Commons CSV", "org.apache.commons.csv", Set.of("catalog", "report")),
            new Framework("Jackson", "com.fasterxml", Set.of("scenario", "report")),
            new Framework("JFreeChart / JFreeSVG", "org.jfree", Set.of("report.chart")),
            new Framework("Commons Math", "org.apache.commons.math3", Set.of("network", "timedomain")));

    /**
     * A file allowed, for a while, to use a framework outside its packages: the exception is named, says
     * why it is there and when it goes, and a test fails once the file no longer needs it.
     *
     * @param file      path below {@code src/main/java/breakwater/}, e.g. {@code cli/Results.java}
     * @param framework {@link Framework#name()}
     * @param until     what removes the need
     */
    record TemporaryException(String file, String framework, String until) {
    }

    /**
     * Temporary exceptions. Each goes when the change named in {@code until} is merged; delete the entry
     * then (the test says so when an entry is no longer used).
     */
    static final List<TemporaryException> TEMPORARY_EXCEPTIONS = List.of();

    /** One broken rule, located for people: {@code file:line: what}. */
    record Violation(String file, int line, String message) {
        @Override
        public String toString() {
            return file + ":" + line + ": " + message;
        }
    }

    private static final Pattern PACKAGE = Pattern.compile("\\bpackage\\s+([a-z][a-z0-9_.]*)\\s*;");
    /** A reference to one of our packages: lower-case segments after {@code breakwater.}. */
    private static final Pattern OWN = Pattern.compile("(?<![A-Za-z0-9_.])breakwater((?:\\.[a-z][a-z0-9_]*)+)");

    private final List<Layer> order;
    private final List<Framework> frameworks;
    private final List<TemporaryException> exceptions;
    private final Set<TemporaryException> used = new LinkedHashSet<>();

    ArchitectureRules(List<Layer> order, List<Framework> frameworks, List<TemporaryException> exceptions) {
        this.order = List.copyOf(order);
        this.frameworks = List.copyOf(frameworks);
        this.exceptions = List.copyOf(exceptions);
    }

    /** The rules as documented. */
    static ArchitectureRules documented() {
        return new ArchitectureRules(ORDER, FRAMEWORKS, TEMPORARY_EXCEPTIONS);
    }

    /** Every package of the order, earliest first. */
    List<String> packages() {
        List<String> out = new ArrayList<>();
        for (Layer l : order) {
            out.addAll(l.packages());
        }
        return out;
    }

    /** Index of the layer holding {@code pkg}, or −1. */
    int layerOf(String pkg) {
        for (int i = 0; i < order.size(); i++) {
            if (order.get(i).packages().contains(pkg)) {
                return i;
            }
        }
        return -1;
    }

    /** Whether code in package {@code from} may use package {@code to} (both below {@code breakwater.}). */
    boolean mayUse(String from, String to) {
        if (from.equals(to)) {
            return true;
        }
        int a = layerOf(from);
        int b = layerOf(to);
        if (a < 0 || b < 0) {
            return false;
        }
        return b < a || (a == b && !order.get(a).siblings());
    }

    /**
     * The violations of one source file.
     *
     * @param file   the file's path below {@code src/main/java/breakwater/}, for messages and exceptions
     * @param source its text
     */
    List<Violation> check(String file, String source) {
        List<Violation> out = new ArrayList<>();
        String code = codeOnly(source);
        Matcher pm = PACKAGE.matcher(code);
        if (!pm.find() || !(pm.group(1).equals("breakwater") || pm.group(1).startsWith("breakwater."))) {
            out.add(new Violation(file, 1, "no 'package breakwater...;' declaration"));
            return out;
        }
        String own = pm.group(1).equals("breakwater") ? "" : pm.group(1).substring("breakwater.".length());
        int packageEnd = pm.end();
        if (layerOf(own) < 0) {
            out.add(new Violation(file, lineAt(code, pm.start()), "package breakwater." + own + " is not in the "
                    + "documented package order (docs/architecture.md); add it there and to the test's ORDER"));
            return out;
        }
        Map<Integer, Set<String>> reported = new LinkedHashMap<>();
        Matcher m = OWN.matcher(code);
        while (m.find()) {
            if (m.start() < packageEnd) {
                continue; // the package declaration itself
            }
            String target = referencedPackage(m.group(1));
            if (target.isEmpty() || mayUse(own, target)) {
                continue;
            }
            int line = lineAt(code, m.start());
            if (reported.computeIfAbsent(line, k -> new LinkedHashSet<>()).add(target)) {
                out.add(new Violation(file, line, "breakwater." + own + " uses breakwater." + target + ", which "
                        + why(own, target) + " (docs/architecture.md)"));
            }
        }
        for (Framework f : frameworks) {
            Pattern use = Pattern.compile("(?<![A-Za-z0-9_.])" + Pattern.quote(f.prefix()) + "\\.");
            Matcher fm = use.matcher(code);
            Set<Integer> lines = new LinkedHashSet<>();
            while (fm.find()) {
                lines.add(lineAt(code, fm.start()));
            }
            if (lines.isEmpty() || f.allowedIn().contains(own)) {
                continue;
            }
            TemporaryException allowed = exceptionFor(file, f);
            if (allowed != null) {
                used.add(allowed);
                continue;
            }
            for (int line : lines) {
                out.add(new Violation(file, line, f.name() + " (" + f.prefix() + ") is used in breakwater." + own
                        + "; it belongs in " + String.join(", ", f.allowedIn().stream().sorted()
                        .map(p -> "breakwater." + p).toList()) + " only (docs/architecture.md)"));
            }
        }
        return out;
    }

    /** The temporary exceptions that no checked file needed: delete them. */
    List<TemporaryException> unusedExceptions() {
        List<TemporaryException> out = new ArrayList<>(exceptions);
        out.removeAll(used);
        return out;
    }

    private TemporaryException exceptionFor(String file, Framework f) {
        for (TemporaryException e : exceptions) {
            if (e.file().equals(file) && e.framework().equals(f.name())) {
                return e;
            }
        }
        return null;
    }

    private String why(String from, String to) {
        int a = layerOf(from);
        int b = layerOf(to);
        if (b < 0) {
            return "is not in the documented package order";
        }
        if (a == b) {
            return "is a sibling in the same layer: the two stay independent";
        }
        return "comes later in the package order";
    }

    /**
     * The package a dotted reference names: the longest run of its segments that is a documented package
     * ({@code .report.chart.Foo} → report.chart), else the lower-case segments before the first
     * upper-case one. "" for {@code breakwater} alone.
     */
    String referencedPackage(String dotted) {
        String[] parts = dotted.substring(1).split("\\.");
        String best = "";
        StringBuilder b = new StringBuilder();
        for (String part : parts) {
            if (b.length() > 0) {
                b.append('.');
            }
            b.append(part);
            if (layerOf(b.toString()) >= 0) {
                best = b.toString();
            }
        }
        // the regex stops at the first upper-case segment, so all segments are lower case: a name that
        // is not documented at all counts as a package of its own
        return best.isEmpty() ? String.join(".", parts) : best;
    }

    private static int lineAt(String text, int offset) {
        int line = 1;
        for (int i = 0; i < offset; i++) {
            if (text.charAt(i) == '\n') {
                line++;
            }
        }
        return line;
    }

    /**
     * The source with comments, string literals, text blocks and character literals blanked out (each
     * character but line breaks replaced by a space), so that offsets and line numbers stay as they were.
     */
    static String codeOnly(String source) {
        Objects.requireNonNull(source, "source");
        StringBuilder b = new StringBuilder(source);
        int n = source.length();
        int i = 0;
        while (i < n) {
            char c = source.charAt(i);
            char next = i + 1 < n ? source.charAt(i + 1) : '\0';
            if (c == '/' && next == '/') {
                int end = source.indexOf('\n', i);
                end = end < 0 ? n : end;
                blank(b, i, end);
                i = end;
            } else if (c == '/' && next == '*') {
                int end = source.indexOf("*/", i + 2);
                end = end < 0 ? n : end + 2;
                blank(b, i, end);
                i = end;
            } else if (c == '"' && source.startsWith("\"\"\"", i)) {
                int end = i + 3;
                while (end < n && !source.startsWith("\"\"\"", end)) {
                    end += source.charAt(end) == '\\' ? 2 : 1;
                }
                end = Math.min(n, end + 3);
                blank(b, i, end);
                i = end;
            } else if (c == '"' || c == '\'') {
                int end = i + 1;
                while (end < n && source.charAt(end) != c && source.charAt(end) != '\n') {
                    end += source.charAt(end) == '\\' ? 2 : 1;
                }
                end = Math.min(n, end + 1);
                blank(b, i, end);
                i = end;
            } else {
                i++;
            }
        }
        return b.toString();
    }

    private static void blank(StringBuilder b, int from, int to) {
        for (int k = from; k < to && k < b.length(); k++) {
            if (b.charAt(k) != '\n') {
                b.setCharAt(k, ' ');
            }
        }
    }
}
