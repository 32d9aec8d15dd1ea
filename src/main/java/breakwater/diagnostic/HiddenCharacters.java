package breakwater.diagnostic;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Invisible and look-alike characters in an input file (docs/file-contracts.md#hidden-characters): a
 * no-break space, a zero-width space or a byte-order mark inside a line looks like a plain space or like
 * nothing at all, yet a parser reads it as a different character, and the message it gives then
 * ("unknown token", "unknown part") sends the user looking in the wrong place. Each such character is
 * named by its code point at its line and column before the file is parsed.
 *
 * <p>One case is accepted: a no-break space (U+00A0), narrow no-break space (U+202F) or thin space
 * (U+2009) between a digit and a unit letter inside a value ({@code "10 nF"} as a word processor or a
 * datasheet writes it) means exactly what a plain space means there. It is read as a plain space and
 * reported as a warning. Anywhere else (in a key, a part name, a header, around a separator) every
 * listed character is refused; a minus sign (U+2212) only before a digit, where it is meant as a sign.
 * A tab is refused inside a TOML string and in a CSV row that has commas (a file without commas is
 * told that it uses another separator). Comments are not looked at.
 */
public final class HiddenCharacters {

    /** The characters looked for, with the name a person knows them by. */
    private static final Map<Integer, String> NAMES = Map.ofEntries(
            Map.entry(0x00A0, "no-break space"),
            Map.entry(0x202F, "narrow no-break space"),
            Map.entry(0x2007, "figure space"),
            Map.entry(0x2009, "thin space"),
            Map.entry(0x200A, "hair space"),
            Map.entry(0x2002, "en space"),
            Map.entry(0x2003, "em space"),
            Map.entry(0x3000, "ideographic space"),
            Map.entry(0x200B, "zero-width space"),
            Map.entry(0x200C, "zero-width non-joiner"),
            Map.entry(0x200D, "zero-width joiner"),
            Map.entry(0x2060, "word joiner"),
            Map.entry(0xFEFF, "byte-order mark"),
            Map.entry(0x00AD, "soft hyphen"),
            Map.entry(0x200E, "left-to-right mark"),
            Map.entry(0x200F, "right-to-left mark"),
            Map.entry(0x2212, "minus sign"));

    /** The file's syntax, which decides where comments and quoted values are. */
    public enum Syntax {
        /** TOML: {@code #} starts a comment outside a string; a tab inside a string is flagged. */
        TOML,
        /** CSV: a line whose first character is {@code #} is a comment; a tab anywhere in a row is flagged. */
        CSV
    }

    /**
     * What a scan found: the text to parse (accepted spaces replaced by plain ones, so every column
     * stays where it was), the warnings for accepted spaces and the refusals.
     */
    public record Scan(String text, List<Diagnostic> warnings, List<Diagnostic> refusals) {
        public Scan {
            warnings = List.copyOf(warnings);
            refusals = List.copyOf(refusals);
        }

        /** The text to parse; throws the refusals, if there are any. */
        public String textOrThrow() throws InputException {
            if (!refusals.isEmpty()) {
                throw new InputException(refusals);
            }
            return text;
        }
    }

    private HiddenCharacters() {
    }

    /** Scans {@code text} (without its leading byte-order mark) of the file shown as {@code source}. */
    public static Scan scan(String text, String source, Syntax syntax) {
        return scan(text, source, syntax, true);
    }

    /**
     * As {@link #scan(String, String, Syntax)}; with {@code acceptUnitSpaces} false a no-break space
     * between a number and a unit is refused too (for a file whose values carry no unit).
     */
    public static Scan scan(String text, String source, Syntax syntax, boolean acceptUnitSpaces) {
        StringBuilder out = new StringBuilder(text.length());
        List<Diagnostic> warnings = new ArrayList<>();
        List<Diagnostic> refusals = new ArrayList<>();
        int line = 1;
        int lineStart = 0;
        int i = 0;
        boolean inComment = false;
        char quote = 0; // the open TOML string's quote, or 0
        while (i < text.length()) {
            int cp = text.codePointAt(i);
            int width = Character.charCount(cp);
            if (cp == '\n') {
                line++;
                lineStart = i + 1;
                inComment = false;
                quote = 0;
                out.append('\n');
                i++;
                continue;
            }
            if (i == lineStart && syntax == Syntax.CSV && cp == '#') {
                inComment = true;
            }
            if (syntax == Syntax.TOML && !inComment) {
                if (quote == 0 && cp == '#') {
                    inComment = true;
                } else if (quote == 0 && (cp == '"' || cp == '\'')) {
                    quote = (char) cp;
                } else if (quote != 0 && cp == quote && !(quote == '"' && escaped(text, i, lineStart))) {
                    quote = 0;
                }
            }
            String name = inComment ? null : NAMES.get(cp);
            if (cp == 0x2212 && !(i + 1 < text.length() && Character.isDigit(text.charAt(i + 1)))) {
                name = null; // a minus sign in words (a description) reads as it looks
            }
            boolean tab = !inComment && cp == '\t' && (quote != 0 || syntax == Syntax.CSV
                    && lineHasComma(text, lineStart)); // a row without commas is left to the separator check
            if (name == null && !tab) {
                out.appendCodePoint(cp);
                i += width;
                continue;
            }
            int column = text.codePointCount(lineStart, i) + 1;
            String code = String.format(Locale.ROOT, "U+%04X", cp);
            if (tab) {
                refusals.add(Diagnostic.at(source, line, column, "U+0009 (tab) at column " + column
                        + (syntax == Syntax.CSV ? ": a row's fields are separated by commas; type a comma or a plain"
                        + " space" : " inside a quoted value: type a plain space")));
                out.append('\t');
            } else if (acceptUnitSpaces && isSpaceBetweenNumberAndUnit(text, i, cp, quote != 0 || syntax == Syntax.CSV)) {
                warnings.add(Diagnostic.at(source, line, column, code + " (" + name + ") at column " + column
                        + " between a number and its unit, read as a plain space; type a plain space to silence this"));
                out.append(' ');
            } else {
                refusals.add(Diagnostic.at(source, line, column, code + " (" + name + ") at column " + column
                        + ": " + advice(cp)));
                out.appendCodePoint(cp);
            }
            i += width;
        }
        return new Scan(out.toString(), warnings, refusals);
    }

    /** What to type instead. */
    private static String advice(int cp) {
        return switch (cp) {
            case 0x200B, 0x200C, 0x200D, 0x2060, 0xFEFF, 0x00AD, 0x200E, 0x200F ->
                    "an invisible character, delete it (retype the text around it)";
            case 0x2212 -> "a number's sign is a plain hyphen-minus '-'";
            default -> "type a plain space";
        };
    }

    /** An accepted space: inside a value, after a digit and before a letter or the micro or ohm sign. */
    private static boolean isSpaceBetweenNumberAndUnit(String text, int i, int cp, boolean inValue) {
        if (!inValue || !(cp == 0x00A0 || cp == 0x202F || cp == 0x2009) || i == 0) {
            return false;
        }
        char before = text.charAt(i - 1);
        int after = i + 1 < text.length() ? text.codePointAt(i + 1) : -1;
        return Character.isDigit(before) && (Character.isLetter(after) || after == 'µ' || after == 'Ω'
                || after == '%');
    }

    private static boolean lineHasComma(String text, int lineStart) {
        int end = text.indexOf('\n', lineStart);
        return text.substring(lineStart, end < 0 ? text.length() : end).indexOf(',') >= 0;
    }

    /** Whether the quote at {@code i} is escaped by an odd run of backslashes before it. */
    private static boolean escaped(String text, int i, int lineStart) {
        int n = 0;
        for (int k = i - 1; k >= lineStart && text.charAt(k) == '\\'; k--) {
            n++;
        }
        return n % 2 == 1;
    }
}
