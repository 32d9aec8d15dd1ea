package breakwater.report;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CyclicBarrier;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** A run's result files reach the folder as one whole set, or not at all. */
class OutputDirectoryTest {

    private static List<String> names(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    private static void set(Path dir, String tag, String... files) throws IOException {
        try (OutputDirectory d = new OutputDirectory(dir, "out")) {
            for (String f : files) {
                d.write(f, w -> w.write(tag + " " + f));
            }
            d.commit();
        }
    }

    @Test
    void aRunThatFailsHalfWayChangesNothingAndLeavesNoStagingFolder(@TempDir Path tmp) throws IOException {
        Path dir = tmp.resolve("out");
        set(dir, "first", "bom.csv", "summary.json");
        assertThatThrownBy(() -> {
            try (OutputDirectory d = new OutputDirectory(dir, "out")) {
                d.write("bom.csv", w -> w.write("second"));
                d.write("summary.json", w -> {
                    throw new IOException("No space left on device");
                });
                d.commit();
            }
        }).hasMessage("cannot write summary.json for out: No space left on device; nothing was changed in out")
                .hasMessageNotContaining("staging");
        assertThat(Files.readString(dir.resolve("bom.csv"))).isEqualTo("first bom.csv");
        assertThat(names(tmp)).containsExactly("out");
    }

    @Test
    void aNewSetReplacesTheLastOneWholeAndLeavesTheUsersFiles(@TempDir Path tmp) throws IOException {
        Path dir = tmp.resolve("out");
        Files.createDirectories(dir);
        Files.writeString(dir.resolve("my-notes.txt"), "mine");
        set(dir, "first", "bom.csv", "rail-droop.cir", "summary.json");
        set(dir, "second", "bom.csv", "summary.json");
        assertThat(names(dir)).containsExactly(".breakwater-files", ".breakwater.lock", "bom.csv", "my-notes.txt",
                "summary.json");
        assertThat(Files.readString(dir.resolve("bom.csv"))).isEqualTo("second bom.csv");
        assertThat(Files.readString(dir.resolve("my-notes.txt"))).isEqualTo("mine");
        assertThat(names(tmp)).containsExactly("out");
    }

    @Test
    void runsWritingIntoOneFolderAtOnceNeverLeaveAMix(@TempDir Path tmp) throws Exception {
        Path dir = tmp.resolve("out");
        String[] files = {"bom.csv", "impedance.csv", "worst-case.csv", "report.html", "summary.json"};
        for (int round = 0; round < 20; round++) {
            CyclicBarrier start = new CyclicBarrier(4);
            List<Thread> runs = new ArrayList<>();
            List<Throwable> failed = new ArrayList<>();
            for (int k = 0; k < 4; k++) {
                String tag = "run" + k;
                Thread t = new Thread(() -> {
                    try {
                        start.await();
                        set(dir, tag, files);
                    } catch (Exception e) {
                        synchronized (failed) {
                            failed.add(e);
                        }
                    }
                });
                runs.add(t);
                t.start();
            }
            for (Thread t : runs) {
                t.join();
            }
            assertThat(failed).isEmpty();
            String tag = Files.readString(dir.resolve("bom.csv")).split(" ")[0];
            for (String f : files) {
                assertThat(Files.readString(dir.resolve(f))).as("round " + round + ", " + f).isEqualTo(tag + " " + f);
            }
            assertThat(names(tmp)).containsExactly("out");
        }
    }

    @Test
    void onlyPlainResultNamesAreWritten(@TempDir Path tmp) {
        OutputDirectory d = new OutputDirectory(tmp.resolve("out"), "out");
        assertThatThrownBy(() -> d.write("../escape.csv", w -> w.write("x"))).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> d.write(".hidden", w -> w.write("x"))).isInstanceOf(IllegalArgumentException.class);
    }
}
