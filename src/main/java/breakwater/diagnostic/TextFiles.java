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

/** Reads input files as UTF-8 text, reporting bytes that are not UTF-8 as a located input problem. */
public final class TextFiles {
    private TextFiles() {
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
