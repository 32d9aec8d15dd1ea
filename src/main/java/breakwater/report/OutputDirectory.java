package breakwater.report;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Writes result files into the user's {@code --out} folder so that a failed run never leaves half a file:
 * each file is written to a temporary sibling, flushed, then moved over the final name in one step.
 * Only Breakwater's own file names are ever written; nothing else in the folder is touched.
 */
public final class OutputDirectory {
    private final Path dir;

    public OutputDirectory(Path dir) {
        this.dir = dir;
    }

    public Path path() {
        return dir;
    }

    /** Something that writes a file's content. */
    @FunctionalInterface
    public interface Content {
        void writeTo(Writer out) throws IOException;
    }

    /** Writes {@code name} atomically; returns the final path. */
    public Path write(String name, Content content) throws IOException {
        Files.createDirectories(dir);
        Path target = dir.resolve(name);
        // a fresh name next to the target; created like any other file, so the user's umask applies
        Path tmp = dir.resolve("." + name + "." + java.util.UUID.randomUUID() + ".tmp");
        try {
            try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8, StandardOpenOption.CREATE_NEW,
                    StandardOpenOption.WRITE)) {
                content.writeTo(w);
            }
            try {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
            return target;
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
