package breakwater.cli;

import org.junit.jupiter.api.Test;

import java.io.PrintWriter;
import java.io.StringWriter;

import static org.assertj.core.api.Assertions.assertThat;

/** Whatever escapes a command is exit 70 and one line asking for a report; the trace only when asked. */
class InternalErrorTest {

    private static String said(Throwable ex, boolean debug) {
        StringWriter s = new StringWriter();
        int code = Main.internalError(ex, new PrintWriter(s), debug);
        assertThat(code).isEqualTo(ExitCodes.INTERNAL);
        return s.toString();
    }

    @Test
    void stackOverflowIsOneLineWithoutTheTrace() {
        String said = said(new StackOverflowError(), false);
        assertThat(said.lines()).hasSize(1);
        assertThat(said).contains("internal error", "StackOverflowError", "please report it", "--debug",
                Main.DEBUG_ENV + "=1").doesNotContain("\tat ");
    }

    @Test
    void outOfMemoryNamesTheHeapAndAWayRound() {
        String said = said(new OutOfMemoryError("Java heap space"), false);
        assertThat(said.lines()).hasSize(1);
        assertThat(said).contains("ran out of memory", "Java heap space", "please report it", "-Xmx")
                .doesNotContain("\tat ");
    }

    @Test
    void theTraceComesWithDebug() {
        String said = said(new IllegalStateException("model self-check failed\nsecond line"), true);
        assertThat(said.lines().findFirst().orElseThrow()).contains("IllegalStateException: model self-check failed")
                .doesNotContain("second line");
        assertThat(said).contains("\tat breakwater.cli.InternalErrorTest");
    }

    @Test
    void debugIsAskedByTheOptionAnywhereBeforeDoubleDashOrByTheVariable() {
        assertThat(Main.debugAsked(new String[] {"check", "a.toml", "--debug"}, null)).isTrue();
        assertThat(Main.debugAsked(new String[] {"--debug", "check", "a.toml"}, null)).isTrue();
        assertThat(Main.debugAsked(new String[] {"check", "--", "--debug"}, null)).isFalse();
        assertThat(Main.debugAsked(new String[] {"check", "a.toml"}, "1")).isTrue();
        assertThat(Main.debugAsked(new String[] {"check", "a.toml"}, "0")).isFalse();
        assertThat(Main.debugAsked(new String[] {"check", "a.toml"}, null)).isFalse();
    }

    @Test
    void theDebugOptionIsAcceptedOnEveryCommand() {
        CliTest.Run r = CliTest.run("check", CliTest.DEMO.toString(), "--bank", CliTest.DEMO_BANK.toString(),
                "--debug", "--quiet");
        assertThat(r.code()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
    }
}
