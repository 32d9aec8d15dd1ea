package breakwater.report.export;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Lines of a SPICE3 netlist built element by element: comments, two-terminal elements with plain SI
 * values at full precision, and series chains that leave out zero-valued elements (SPICE cannot take an
 * inductor of 0 H, and a resistor of 0 Ω is refused or replaced by some simulators). Element and node
 * names are checked to be plain identifiers and unique, ignoring case as SPICE does.
 */
final class SpiceNetlist {
    private static final Pattern NAME = Pattern.compile("[A-Za-z][A-Za-z0-9_]*");

    private final List<String> lines = new ArrayList<>();
    private final Set<String> elementNames = new HashSet<>();

    /** A comment line ({@code * text}); the text is made plain ASCII. */
    SpiceNetlist comment(String text) {
        lines.add(("* " + Ascii.of(text)).stripTrailing());
        return this;
    }

    /** A line given whole (a dot card or an element with a source specification). */
    SpiceNetlist line(String text) {
        lines.add(text);
        return this;
    }

    /**
     * A two-terminal element {@code name nodeA nodeB value}; the first letter of {@code name} is its kind
     * (R, L, C), as SPICE reads it.
     */
    SpiceNetlist element(String name, String nodeA, String nodeB, double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + ": element value must be positive and finite, got " + value);
        }
        lines.add(declare(name) + " " + node(nodeA) + " " + node(nodeB) + " " + number(value));
        return this;
    }

    /** Registers {@code name} as an element name; returns it. */
    String declare(String name) {
        if (!NAME.matcher(name).matches()) {
            throw new IllegalArgumentException("not a SPICE element name: " + name);
        }
        if (!elementNames.add(name.toUpperCase(Locale.ROOT))) {
            throw new IllegalArgumentException("element name used twice: " + name);
        }
        return name;
    }

    static String node(String name) {
        if (!name.equals("0") && !NAME.matcher(name).matches()) {
            throw new IllegalArgumentException("not a SPICE node name: " + name);
        }
        return name;
    }

    /**
     * Elements in series from {@code from} to {@code to}: resistance {@code r}, inductance {@code l}, then
     * capacitance {@code c} (0 for none), in that order, each left out when it is 0. The nodes between
     * them are named {@code tag_l} (before the inductor) and {@code tag_c} (before the capacitor); the
     * elements {@code R<tag>}, {@code L<tag>}, {@code C<tag>}. When every value is 0 the two nodes are
     * joined by a 0 V source {@code V<tag>}, SPICE's plain short circuit.
     */
    SpiceNetlist series(String tag, String from, String to, double r, double l, double c) {
        List<Character> kinds = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        if (r > 0) {
            kinds.add('R');
            values.add(r);
        }
        if (l > 0) {
            kinds.add('L');
            values.add(l);
        }
        if (c > 0) {
            kinds.add('C');
            values.add(c);
        }
        if (kinds.isEmpty()) {
            lines.add(declare("V" + tag) + " " + node(from) + " " + node(to) + " DC 0");
            return this;
        }
        String a = from;
        for (int k = 0; k < kinds.size(); k++) {
            String b = k + 1 < kinds.size() ? tag + "_" + Character.toLowerCase(kinds.get(k + 1)) : to;
            element(kinds.get(k) + tag, a, b, values.get(k));
            a = b;
        }
        return this;
    }

    List<String> lines() {
        return List.copyOf(lines);
    }

    /** A plain SI number at full precision, the same whatever the machine's locale (e.g. 1.0E-9). */
    static String number(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("not a finite number: " + v);
        }
        return Double.toString(v);
    }
}
