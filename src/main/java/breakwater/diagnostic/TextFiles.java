package breakwater.diagnostic;

import java.io.IOException;
import java.io.Reader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Reads input files as UTF-8 text, reporting bytes that are not UTF-8 as a located input problem, and
 * holds the size limits every input file keeps (docs/file-contracts.md#input-limits): at most
 * {@value #MAX_BYTES} bytes and lines of at most {@value #MAX_LINE_LENGTH} characters. The largest
 * catalog breakwater reads (20,000 parts) is a few MB; a file beyond these limits is the wrong file.
 */
public final class TextFiles {
    /** The largest input file read, in bytes (64 MiB). */
    public static final long MAX_BYTES = 64L * 1024 * 1024;
    /** The longest line of an input file, in UTF-16 characters. */
    public static final int MAX_LINE_LENGTH = 10_000;

    private TextFiles() {
    }

    /**
     * As {@link #readUtf8(Path, String)}, saying what was expected when {@code file} is a folder or too
     * large.
     *
     * @param expected what the file should be, for messages ("a scenario file (TOML)")
     */
    public static String readUtf8(Path file, String displayName, String expected) throws InputException, IOException {
        if (Files.isDirectory(file)) {
            throw new java.nio.file.FileSystemException(displayName, null, "is a folder, not a file; give "
                    + expected);
        }
        if (Files.isRegularFile(file) && Files.size(file) > MAX_BYTES) {
            throw new InputException(Diagnostic.of(displayName, "the file is " + Files.size(file) / (1024 * 1024)
                    + " MiB, more than the " + MAX_BYTES / (1024 * 1024) + " MiB an input file may have; is this "
                    + expected + "?"));
        }
        return readUtf8(file, displayName);
    }

    /**
     * Refuses a line longer than {@value #MAX_LINE_LENGTH} characters (a file that is not what it should
     * be, or a row run together), located at its line.
     */
    public static void checkLines(String text, String displayName) throws InputException {
        int line = 1;
        int start = 0;
        while (start <= text.length()) {
            int end = text.indexOf('\n', start);
            int stop = end < 0 ? text.length() : end;
            if (stop - start > MAX_LINE_LENGTH) {
                throw new InputException(Diagnostic.at(displayName, line, 1, "line " + line + " is "
                        + (stop - start) + " characters long, more than the " + MAX_LINE_LENGTH
                        + " an input line may have; is this the right file, or are several lines run together?"));
            }
            if (end < 0) {
                break;
            }
            line++;
            start = end + 1;
        }
    }

    /**
     * The whole file as text, without a leading byte-order mark.
     *
     * @throws InputException if the file is not valid UTF-8 (located at the first bad byte's line)
     * @throws IOException    if the file cannot be read
     */
    public static String readUtf8(Path file, String displayName) throws InputException, IOException {
        byte[] bytes = Files.readAllBytes(file);
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length + 1);
        CoderResult result = decoder.decode(in, out, true);
        if (result.isError()) {
            int bad = in.position();
            int line = 1;
            int lineStart = 0;
            for (int k = 0; k < bad; k++) {
                if (bytes[k] == '\n') {
                    line++;
                    lineStart = k + 1;
                }
            }
            String decodedPart = new String(bytes, lineStart, bad - lineStart, StandardCharsets.UTF_8);
            int column = decodedPart.codePointCount(0, decodedPart.length()) + 1;
            throw new InputException(Diagnostic.at(displayName, line, column,
                    "this byte is not UTF-8 text, input files must be saved as UTF-8"));
        }
        decoder.flush(out);
        out.flip();
        return stripBom(out.toString());
    }

    /** Everything {@code in} delivers, without a leading byte-order mark. */
    public static String readAll(Reader in) throws IOException {
        StringBuilder b = new StringBuilder();
        char[] buf = new char[8192];
        int n;
        while ((n = in.read(buf)) >= 0) {
            b.append(buf, 0, n);
        }
        return stripBom(b.toString());
    }

    private static String stripBom(String s) {
        return !s.isEmpty() && s.charAt(0) == '\uFEFF' ? s.substring(1) : s;
    }
}
