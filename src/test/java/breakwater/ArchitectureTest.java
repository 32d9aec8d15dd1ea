package breakwater;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The package order and the framework boundaries of docs/architecture.md, held on every main source
 * file; and the checker itself ({@link ArchitectureRules}) on small sources in memory, so that it is
 * known to fail where it should.
 */
class ArchitectureTest {
    static final Path ROOT = Path.of("").toAbsolutePath();
    static final Path MAIN = ROOT.resolve("src/main/java/breakwater");

    static List<Path> mainSources() throws IOException {
        try (Stream<Path> s = Files.walk(MAIN)) {
            return s.filter(p -> p.toString().endsWith(".java")).sorted().toList();
        }
    }

    static String relative(Path p) {
        return MAIN.relativize(p).toString().replace('\\', '/');
    }

    @Test
    void mainSourcesKeepThePackageOrderAndTheFrameworkBoundaries() throws IOException {
        ArchitectureRules rules = ArchitectureRules.documented();
        List<ArchitectureRules.Violation> found = new ArrayList<>();
        List<Path> files = mainSources();
        for (Path p : files) {
            found.addAll(rules.check(relative(p), Files.readString(p, StandardCharsets.UTF_8)));
        }
        assertThat(files).as("main sources found").hasSizeGreaterThan(50);
        assertThat(found).as("offending lines (src/main/java/breakwater/FILE:LINE)%n%s",
                String.join("\n", found.stream().map(Object::toString).toList())).isEmpty();
        assertThat(rules.unusedExceptions()).as("temporary exceptions no file needs any more: delete them from "
                + "ArchitectureRules.TEMPORARY_EXCEPTIONS").isEmpty();
    }

    /** A citation of the project's documents in source: a file of {@code docs/*.md}, with an optional anchor. */
    /** Any Markdown file named in source: it must be one of the repository's own. */
    static final Pattern ANY_DOCUMENT = Pattern.compile("(?<![A-Za-z0-9_./-])([A-Za-z0-9_][A-Za-z0-9_./-]*\\.md)\\b");

    static final Pattern DOC_REFERENCE = Pattern.compile("docs/([a-z0-9-]+\\.md)(?:#([a-z0-9-]+))?");

    /**
     * Every {@code docs/…md#anchor} that a main or test source, the contributor guide or the README cites
     * names a file of the repository's {@code docs/} and, with an anchor, an {@code id} in that file; and every other
     * Markdown file a source names is one of the repository's own.
     */
    @Test
    void everyDocumentReferenceResolvesInsideTheRepository() throws IOException {
        List<Path> files = new ArrayList<>();
        try (Stream<Path> s = Stream.concat(Files.walk(ROOT.resolve("src/main/java")), Files.walk(ROOT.resolve("src/test/java")))) {
            s.filter(p -> p.toString().endsWith(".java")).sorted().forEach(files::add);
        }
        files.add(ROOT.resolve("DEVELOPERS.md"));
        files.add(ROOT.resolve("README.md"));
        List<String> broken = new ArrayList<>();
        int found = 0;
        for (Path p : files) {
            List<String> lines = Files.readAllLines(p, StandardCharsets.UTF_8);
            for (int i = 0; i < lines.size(); i++) {
                String line = lines.get(i);
                Matcher any = ANY_DOCUMENT.matcher(line);
                while (any.find()) {
                    String name = any.group(1);
                    if (!Files.isRegularFile(ROOT.resolve(name)) && !Files.isRegularFile(ROOT.resolve("docs").resolve(name))) {
                        broken.add(ROOT.relativize(p) + ":" + (i + 1) + ": " + name + " is not a document of the repository");
                    }
                }
                Matcher m = DOC_REFERENCE.matcher(line);
                while (m.find()) {
                    found++;
                    Path doc = ROOT.resolve("docs").resolve(m.group(1));
                    if (!Files.isRegularFile(doc)) {
                        broken.add(ROOT.relativize(p) + ":" + (i + 1) + ": docs/" + m.group(1) + " does not exist");
                    } else if (m.group(2) != null
                            && !Files.readString(doc, StandardCharsets.UTF_8).contains("id=\"" + m.group(2) + "\"")) {
                        broken.add(ROOT.relativize(p) + ":" + (i + 1) + ": docs/" + m.group(1) + " has no anchor '"
                                + m.group(2) + "'");
                    }
                }
            }
        }
        assertThat(found).as("document references found").isGreaterThan(30);
        assertThat(broken).as("document references that do not resolve").isEmpty();
    }

    @Test
    void everyPackageIsInTheOrderAndHasAPackageInfoNamingItsDocument() throws IOException {
        ArchitectureRules rules = ArchitectureRules.documented();
        TreeSet<String> packages = new TreeSet<>();
        for (Path p : mainSources()) {
            packages.add(MAIN.relativize(p.getParent()).toString().replace('\\', '/').replace('/', '.'));
        }
        Pattern doc = Pattern.compile("docs/([a-z-]+\\.md)");
        List<String> problems = new ArrayList<>();
        for (String pkg : packages) {
            if (rules.layerOf(pkg) < 0) {
                problems.add("breakwater." + pkg + ": not in the documented package order");
            }
            Path info = MAIN.resolve(pkg.replace('.', '/')).resolve("package-info.java");
            if (!Files.isRegularFile(info)) {
                problems.add("breakwater." + pkg + ": no package-info.java (role, what it may use, which doc to read)");
                continue;
            }
            Matcher m = doc.matcher(Files.readString(info));
            if (!m.find()) {
                problems.add(relative(info) + ": names no document in docs/");
            }
            m.reset();
            while (m.find()) {
                if (!Files.isRegularFile(ROOT.resolve("docs").resolve(m.group(1)))) {
                    problems.add(relative(info) + ": names docs/" + m.group(1) + ", which does not exist");
                }
            }
        }
        assertThat(problems).as(String.join("\n", problems)).isEmpty();
    }

    // ---- the checker on sources in memory ------------------------------------------------------------

    private static List<String> check(String file, String source) {
        return ArchitectureRules.documented().check(file, source).stream().map(Object::toString).toList();
    }

    @Test
    void anImportOfALaterPackageIsReportedWithFileAndLine() {
        String src = """
                package breakwater.network;

                import breakwater.scenario.Band;
                import breakwater.design.CapacitorBank;

                final class Example {
                }
                """;
        assertThat(check("network/Example.java", src)).singleElement().asString()
                .startsWith("network/Example.java:4: breakwater.network uses breakwater.design, which comes later");
    }

    @Test
    void aFullyQualifiedNameInCodeCountsButNotInCommentsOrStrings() {
        String src = """
                package breakwater.timedomain;

                /** See breakwater.cli.Main for how this is run. */
                final class Example {
                    // breakwater.optimize.BankSearch calls this
                    String s = "breakwater.report.SummaryJson";
                    String block = \"""
                            breakwater.cli.Main
                            \""";
                    Object o = breakwater.optimize.BankSearch.class;
                    int x = breakwater.units.EngineeringNotation.class.hashCode();
                }
                """;
        assertThat(check("timedomain/Example.java", src)).singleElement().asString()
                .startsWith("timedomain/Example.java:10: breakwater.timedomain uses breakwater.optimize");
    }

    @Test
    void siblingsStayIndependentAndTheChartsSitBelowTheReport() {
        assertThat(check("catalog/A.java", "package breakwater.catalog;\nimport breakwater.scenario.Band;\n"))
                .singleElement().asString().contains("sibling");
        assertThat(check("report/A.java", "package breakwater.report;\nimport breakwater.report.chart.X;\n"))
                .isEmpty();
        assertThat(check("report/chart/A.java", "package breakwater.report.chart;\n"
                + "import breakwater.report.ReportModel;\nimport breakwater.optimize.BankSearch;\n"))
                .singleElement().asString().startsWith("report/chart/A.java:2:");
    }

    @Test
    void aFrameworkOutsideItsPackagesIsReportedOnEveryLine() {
        String src = """
                package breakwater.design;

                import ai.timefold.solver.core.api.score.BendableScore;

                final class Example {
                    Object o = picocli.CommandLine.class;
                    Object p = org.apache.commons.math3.util.FastMath.class;
                }
                """;
        assertThat(check("design/Example.java", src)).containsExactly(
                "design/Example.java:3: Timefold Solver (ai.timefold) is used in breakwater.design; it belongs in "
                        + "breakwater.optimize only (docs/architecture.md)",
                "design/Example.java:6: picocli (picocli) is used in breakwater.design; it belongs in "
                        + "breakwater.cli only (docs/architecture.md)",
                "design/Example.java:7: Commons Math (org.apache.commons.math3) is used in breakwater.design; it "
                        + "belongs in breakwater.network, breakwater.timedomain only (docs/architecture.md)");
        assertThat(check("optimize/Example.java", "package breakwater.optimize;\nimport ai.timefold.solver.X;\n"))
                .isEmpty();
    }

    @Test
    void aTemporaryExceptionCoversOnlyItsFileAndItsFrameworkAndIsReportedOnceUnused() {
        ArchitectureRules rules = new ArchitectureRules(ArchitectureRules.ORDER, ArchitectureRules.FRAMEWORKS,
                java.util.List.of(
                        new ArchitectureRules.TemporaryException("cli/Results.java", "Jackson", "a test"),
                        new ArchitectureRules.TemporaryException("cli/RunExtras.java", "Jackson", "a test"),
                        new ArchitectureRules.TemporaryException("report/Charts.java", "JFreeChart / JFreeSVG",
                                "a test")));
        String jackson = "package breakwater.cli;\nimport com.fasterxml.jackson.databind.node.ObjectNode;\n";
        assertThat(rules.check("cli/Results.java", jackson)).isEmpty();
        assertThat(rules.check("cli/SolveCommand.java", jackson)).singleElement().asString()
                .startsWith("cli/SolveCommand.java:2: Jackson");
        assertThat(rules.check("cli/Results.java", "package breakwater.cli;\nimport org.jfree.svg.SVGGraphics2D;\n"))
                .singleElement().asString().contains("JFreeChart");
        assertThat(rules.unusedExceptions()).extracting(ArchitectureRules.TemporaryException::file)
                .doesNotContain("cli/Results.java").contains("cli/RunExtras.java", "report/Charts.java");
    }

    @Test
    void aPackageOutsideTheOrderIsReported() {
        assertThat(check("extra/A.java", "package breakwater.extra;\n")).singleElement().asString()
                .contains("not in the documented package order");
        assertThat(check("units/A.java", "package breakwater.units;\nimport breakwater.extra.Thing;\n"))
                .singleElement().asString().contains("is not in the documented package order");
    }

    @Test
    void codeOnlyBlanksCommentsAndLiteralsButKeepsLines() {
        String src = "a /* b\nc */ d // e\n\"f\\\"g\" 'h' i";
        String code = ArchitectureRules.codeOnly(src);
        assertThat(code).hasSameSizeAs(src);
        assertThat(code.lines().toList()).hasSize(3);
        assertThat(code.replaceAll("\\s+", " ").strip()).isEqualTo("a d i");
    }
}
