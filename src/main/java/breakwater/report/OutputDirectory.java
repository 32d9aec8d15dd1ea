package breakwater.report;

import java.io.IOException;
import java.io.Writer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.UUID;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.locks.ReentrantLock;

/**
 * Writes one run's result files into the user's {@code --out} folder as a whole set, so that a failed run
 * never leaves half a file and two runs writing into one folder never leave a mix of their files.
 *
 * <p>Every file is first written into a staging folder beside the target ({@code .NAME.staging-…}, on the
 * same drive, so moving is renaming). {@link #commit()} then takes the folder's lock (the file
 * {@code .breakwater.lock} inside it, held with an operating-system file lock, and a lock within this
 * program for runs in one process), moves the staged files in, each by one rename over its final name,
 * removes the files of the previous set that this set does not have (read from {@code .breakwater-files},
 * which lists the last set moved in: only files Breakwater wrote there itself are ever removed), and writes
 * the new list. A run that ends before {@link #commit()} leaves nothing but removes its staging folder
 * ({@link #close()}). Messages name the final files, never the staging ones. Nothing else in the folder is
 * touched.
 */
public final class OutputDirectory implements AutoCloseable {
    /** The lock file inside the result folder; it stays there, empty. */
    static final String LOCK = ".breakwater.lock";
    /** The names of the last set moved into the folder, one a line. */
    static final String SET_LIST = ".breakwater-files";

    private static final ConcurrentHashMap<Path, ReentrantLock> IN_PROCESS = new ConcurrentHashMap<>();

    private final Path dir;
    private final String shown;
    private final Set<String> names = new LinkedHashSet<>();
    private Path staging;
    private boolean committed;

    public OutputDirectory(Path dir) {
        this(dir, dir.toString());
    }

    /** @param shown how the user wrote the folder, for messages */
    public OutputDirectory(Path dir, String shown) {
        this.dir = dir.toAbsolutePath().normalize();
        this.shown = shown;
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

    /** Writes {@code name} into the staging folder; it reaches the result folder with {@link #commit()}. */
    public void write(String name, Content content) throws IOException {
        if (committed) {
            throw new IllegalStateException("the set was already moved into " + shown);
        }
        if (name.contains("/") || name.contains("\\") || name.startsWith(".")) {
            throw new IllegalArgumentException("not a result file name: " + name);
        }
        try {
            if (staging == null) {
                Path parent = dir.getParent();
                Files.createDirectories(parent);
                staging = Files.createDirectory(parent.resolve("." + dir.getFileName() + ".staging-" + UUID.randomUUID()));
            }
            try (Writer w = Files.newBufferedWriter(staging.resolve(name), StandardCharsets.UTF_8,
                    StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)) {
                content.writeTo(w);
            }
        } catch (IOException e) {
            throw new IOException("cannot write " + name + " for " + shown + ": " + reason(e)
                    + "; nothing was changed in " + shown, e);
        }
        names.add(name);
    }

    /**
     * Moves the staged set into the result folder under its lock (waiting for another run's move to end),
     * and removes the previous set's files that this one lacks.
     *
     * @return the final paths, in the order written
     */
    public List<Path> commit() throws IOException {
        if (committed) {
            throw new IllegalStateException("the set was already moved into " + shown);
        }
        committed = true;
        List<Path> moved = new ArrayList<>();
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw new IOException("cannot create the folder " + shown + " for the results: " + reason(e), e);
        }
        ReentrantLock local = IN_PROCESS.computeIfAbsent(dir, d -> new ReentrantLock());
        local.lock();
        try (FileChannel lockFile = FileChannel.open(dir.resolve(LOCK), StandardOpenOption.CREATE,
                StandardOpenOption.WRITE); FileLock held = lockFile.lock()) {
            Set<String> previous = previousSet();
            for (String name : names) {
                Path target = dir.resolve(name);
                try {
                    move(staging.resolve(name), target);
                } catch (IOException e) {
                    throw new IOException("cannot move " + name + " into " + shown + ": " + reason(e), e);
                }
                moved.add(target);
            }
            for (String old : previous) {
                if (!names.contains(old) && !old.startsWith(".") && !old.contains("/") && !old.contains("\\")) {
                    Files.deleteIfExists(dir.resolve(old));
                }
            }
            Path list = dir.resolve(SET_LIST + "." + UUID.randomUUID());
            Files.writeString(list, String.join("\n", names) + "\n", StandardCharsets.UTF_8);
            move(list, dir.resolve(SET_LIST));
        } catch (IOException e) {
            if (e.getMessage() != null && e.getMessage().startsWith("cannot ")) {
                throw e;
            }
            throw new IOException("cannot write the results into " + shown + ": " + reason(e), e);
        } finally {
            local.unlock();
            close();
        }
        return moved;
    }

    /** Removes the staging folder and whatever is left in it (all of it after a failed run). */
    @Override
    public void close() {
        if (staging == null) {
            return;
        }
        try (DirectoryStream<Path> left = Files.newDirectoryStream(staging)) {
            for (Path p : left) {
                Files.deleteIfExists(p);
            }
            Files.deleteIfExists(staging);
        } catch (IOException e) {
            // best effort: a staging folder that cannot be removed holds only copies of results
        }
        staging = null;
    }

    private Set<String> previousSet() throws IOException {
        Path list = dir.resolve(SET_LIST);
        if (!Files.isRegularFile(list)) {
            return Set.of();
        }
        Set<String> out = new LinkedHashSet<>();
        for (String line : Files.readAllLines(list, StandardCharsets.UTF_8)) {
            if (!line.isBlank()) {
                out.add(line.strip());
            }
        }
        return out;
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /** Why an operation failed, in words, without the paths of the staging folder. */
    private static String reason(IOException e) {
        if (e instanceof java.nio.file.AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof NoSuchFileException) {
            return "a folder on the way is missing or cannot hold new files";
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason();
        }
        return e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    }
}
