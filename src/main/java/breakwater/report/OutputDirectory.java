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

    /**
     * Checks, before any work, that the folder {@code dir} exists or can be created: the nearest folder
     * above it that exists must take a new folder (tried with an empty one, removed at once).
     *
     * @param shown how the user wrote the folder, for the message
     * @throws IOException saying which folder refuses and why, and what to do
     */
    public static void checkCreatable(Path dir, String shown) throws IOException {
        Path abs = dir.toAbsolutePath().normalize();
        if (Files.isDirectory(abs)) {
            if (!Files.isWritable(abs)) {
                throw new IOException("cannot write the results into '" + shown + "': the folder is not writable "
                        + "(permission denied); choose a folder you can write to");
            }
            return;
        }
        Path existing = abs.getParent();
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        if (existing == null) {
            throw new IOException("cannot create the folder '" + shown + "' for the results: no folder above it "
                    + "exists; give a folder on a mounted drive");
        }
        if (!Files.isDirectory(existing)) {
            throw new IOException("cannot create the folder '" + shown + "' for the results: '" + existing
                    + "' is a file, not a folder; choose another --out");
        }
        Path probe;
        try {
            probe = Files.createTempDirectory(existing, ".breakwater-");
        } catch (IOException e) {
            String why = e instanceof java.nio.file.AccessDeniedException ? "permission denied"
                    : e instanceof java.nio.file.NoSuchFileException ? "that file system takes no new folders"
                    : e instanceof java.nio.file.FileSystemException f && f.getReason() != null ? f.getReason()
                    : e.getClass().getSimpleName();
            throw new IOException("cannot create the folder '" + shown + "' for the results: '" + existing
                    + "' does not let a folder be made in it (" + why + "); choose a folder you can write to", e);
        }
        Files.deleteIfExists(probe);
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
