package breakwater.scenario;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Finds where table headers, keys and values sit in a TOML text, so that problems found in the parsed
 * tree can be reported at their line and column. The parsed tree does not keep positions, so the text
 * is scanned line by line: {@code [table]} and {@code [[table]]} headers, {@code key = value} lines with
 * bare, quoted and dotted keys. Multi-line strings and arrays are skipped; keys inside inline tables are
 * not located (their table's key is used instead).
 *
 * <p>Lines and columns are 1-based; columns count Unicode code points from the start of the line.
 */
final class TomlLocator {

    /** A place in the text. */
    record Pos(int line, int column) {
        static final Pos START = new Pos(1, 1);
    }

    private final Map<List<String>, Pos> headers = new HashMap<>();
    private final Map<List<String>, Pos> keys = new HashMap<>();
    private final Map<List<String>, Pos> values = new HashMap<>();
    private Duplicate firstDuplicate;

    /**
     * A key or table defined a second time: its path, whether the second definition is a table header,
     * where it is (the header's {@code [}, or the key) and the line of the first definition.
     */
    record Duplicate(List<String> path, boolean table, Pos at, int firstLine) {
    }

    TomlLocator(String text) {
        String[] lines = text.split("\n", -1);
        List<String> table = List.of();
        String openMultiline = null;
        int arrayDepth = 0;
        for (int ln = 0; ln < lines.length; ln++) {
            String line = lines[ln].endsWith("\r") ? lines[ln].substring(0, lines[ln].length() - 1) : lines[ln];
            if (openMultiline != null) {
                if (line.contains(openMultiline)) {
                    openMultiline = null;
                }
                continue;
            }
            if (arrayDepth > 0) {
                arrayDepth += bracketBalance(line, 0);
                continue;
            }
            int i = skipSpaces(line, 0);
            if (i >= line.length() || line.charAt(i) == '#') {
                continue;
            }
            if (line.charAt(i) == '[') {
                boolean arrayTable = line.startsWith("[[", i);
                int start = skipSpaces(line, i + (arrayTable ? 2 : 1));
                Optional<KeyPath> header = parseKey(line, start);
                if (header.isPresent()) {
                    table = header.get().segments();
                    Pos p = pos(ln, line, start);
                    if (!arrayTable && headers.containsKey(table)) {
                        noteDuplicate(new Duplicate(table, true, pos(ln, line, i), headers.get(table).line()));
                    } else if (!arrayTable && keys.containsKey(table)) {
                        noteDuplicate(new Duplicate(table, true, pos(ln, line, i), keys.get(table).line()));
                    }
                    headers.putIfAbsent(table, p);
                }
                continue;
            }
            Optional<KeyPath> key = parseKey(line, i);
            if (key.isEmpty()) {
                continue;
            }
            int eq = skipSpaces(line, key.get().end());
            if (eq >= line.length() || line.charAt(eq) != '=') {
                continue;
            }
            int v = skipSpaces(line, eq + 1);
            List<String> path = new ArrayList<>(table);
            path.addAll(key.get().segments());
            path = List.copyOf(path);
            if (keys.containsKey(path)) {
                noteDuplicate(new Duplicate(path, false, pos(ln, line, i), keys.get(path).line()));
            } else if (headers.containsKey(path)) {
                noteDuplicate(new Duplicate(path, false, pos(ln, line, i), headers.get(path).line()));
            }
            keys.putIfAbsent(path, pos(ln, line, i));
            values.putIfAbsent(path, pos(ln, line, v));
            if (line.startsWith("\"\"\"", v) || line.startsWith("'''", v)) {
                String delimiter = line.substring(v, v + 3);
                if (line.indexOf(delimiter, v + 3) < 0) {
                    openMultiline = delimiter;
                }
            } else if (v < line.length() && line.charAt(v) == '[') {
                arrayDepth = bracketBalance(line, v);
            }
        }
    }

    /** Where the value of {@code path} starts, else its key, else its nearest located parent. */
    Pos value(List<String> path) {
        Pos p = values.get(path);
        return p != null ? p : key(path);
    }

    /** Where the key of {@code path} starts (or its table header), else its nearest located parent. */
    Pos key(List<String> path) {
        Pos p = keys.get(path);
        if (p == null) {
            p = headers.get(path);
        }
        if (p != null) {
            return p;
        }
        return path.isEmpty() ? Pos.START : key(path.subList(0, path.size() - 1));
    }

    /** Where the table {@code path} is declared ({@code [path]}, or {@code path = { … }}). */
    Pos table(List<String> path) {
        Pos p = headers.get(path);
        return p != null ? p : key(path);
    }

    /** The first key or table seen defined twice, if any. */
    Optional<Duplicate> firstDuplicate() {
        return Optional.ofNullable(firstDuplicate);
    }

    private void noteDuplicate(Duplicate d) {
        if (firstDuplicate == null) {
            firstDuplicate = d;
        }
    }

    private record KeyPath(List<String> segments, int end) {
    }

    private static Optional<KeyPath> parseKey(String line, int start) {
        List<String> segments = new ArrayList<>();
        int i = start;
        while (true) {
            i = skipSpaces(line, i);
            if (i >= line.length()) {
                return Optional.empty();
            }
            char c = line.charAt(i);
            StringBuilder seg = new StringBuilder();
            if (c == '"') {
                i++;
                while (i < line.length() && line.charAt(i) != '"') {
                    char d = line.charAt(i);
                    if (d == '\\' && i + 1 < line.length()) {
                        char e = line.charAt(i + 1);
                        if (e == 'u' && i + 6 <= line.length()) {
                            seg.append((char) Integer.parseInt(line.substring(i + 2, i + 6), 16));
                            i += 6;
                            continue;
                        }
                        seg.append(switch (e) {
                            case 'n' -> '\n';
                            case 't' -> '\t';
                            case 'r' -> '\r';
                            case 'b' -> '\b';
                            case 'f' -> '\f';
                            default -> e;
                        });
                        i += 2;
                        continue;
                    }
                    seg.append(d);
                    i++;
                }
                if (i >= line.length()) {
                    return Optional.empty();
                }
                i++;
            } else if (c == '\'') {
                int close = line.indexOf('\'', i + 1);
                if (close < 0) {
                    return Optional.empty();
                }
                seg.append(line, i + 1, close);
                i = close + 1;
            } else {
                while (i < line.length() && isBareKeyChar(line.charAt(i))) {
                    seg.append(line.charAt(i));
                    i++;
                }
                if (seg.isEmpty()) {
                    return Optional.empty();
                }
            }
            segments.add(seg.toString());
            int after = skipSpaces(line, i);
            if (after < line.length() && line.charAt(after) == '.') {
                i = after + 1;
                continue;
            }
            return Optional.of(new KeyPath(List.copyOf(segments), i));
        }
    }

    private static boolean isBareKeyChar(char c) {
        return (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z') || (c >= '0' && c <= '9') || c == '_' || c == '-';
    }

    /** Opening minus closing brackets from {@code start}, ignoring strings and comments. */
    private static int bracketBalance(String line, int start) {
        int depth = 0;
        int i = start;
        while (i < line.length()) {
            char c = line.charAt(i);
            if (c == '#') {
                break;
            } else if (c == '"' || c == '\'') {
                int j = i + 1;
                while (j < line.length() && line.charAt(j) != c) {
                    j += (c == '"' && line.charAt(j) == '\\') ? 2 : 1;
                }
                i = j + 1;
                continue;
            } else if (c == '[') {
                depth++;
            } else if (c == ']') {
                depth--;
            }
            i++;
        }
        return depth;
    }

    private static int skipSpaces(String line, int i) {
        while (i < line.length() && (line.charAt(i) == ' ' || line.charAt(i) == '\t')) {
            i++;
        }
        return i;
    }

    private static Pos pos(int lineIndex, String line, int index) {
        return new Pos(lineIndex + 1, line.codePointCount(0, Math.min(index, line.length())) + 1);
    }
}
