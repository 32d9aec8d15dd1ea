package breakwater.report.export;

/**
 * Plain ASCII for text that goes into netlists and Touchstone files, which older readers take as bytes:
 * common symbols are spelled out, anything else becomes '?'. Line breaks become spaces so that a name
 * can never end a comment line early.
 */
final class Ascii {
    private Ascii() {
    }

    static String of(String s) {
        StringBuilder b = new StringBuilder(s.length());
        s.codePoints().forEach(c -> {
            switch (c) {
                case 'Ω' -> b.append("Ohm");
                case 'µ', 'μ' -> b.append('u');
                case '·', '×' -> b.append('*');
                case '−', '–', '—' -> b.append('-');
                case '±' -> b.append("+/-");
                case 'Δ' -> b.append("d");
                case '°' -> b.append(" deg");
                case '\r', '\n', '\t' -> b.append(' ');
                default -> {
                    if (c >= 0x20 && c < 0x7f) {
                        b.append((char) c);
                    } else {
                        b.append('?');
                    }
                }
            }
        });
        return b.toString();
    }
}
