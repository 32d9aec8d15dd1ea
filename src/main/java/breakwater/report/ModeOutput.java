package breakwater.report;

import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;
import java.util.function.UnaryOperator;

/**
 * What one mode (or the Monte Carlo run) adds to the common output written by {@link ResultWriter}:
 * console text printed before the verdict, summary.json keys, report sections, and a change to the
 * report model (overlaid curves, a key figure).
 *
 * @param console  text printed after the bank's summary, before the verdict ("" for none)
 * @param summary  adds keys to summary.json
 * @param sections extra report sections, in order
 * @param model    applied to the report model before it is written
 */
record ModeOutput(String console, Consumer<ObjectNode> summary, List<ReportModel.Section> sections,
                  UnaryOperator<ReportModel> model) {
    ModeOutput {
        Objects.requireNonNull(console, "console");
        Objects.requireNonNull(summary, "summary");
        sections = List.copyOf(sections);
        Objects.requireNonNull(model, "model");
    }

    static final ModeOutput NONE = new ModeOutput("", s -> { }, List.of(), m -> m);

    ModeOutput(String console, Consumer<ObjectNode> summary, List<ReportModel.Section> sections) {
        this(console, summary, sections, m -> m);
    }

    /** Both, this one first: console texts a blank line apart, keys, sections and model changes in order. */
    ModeOutput plus(ModeOutput other) {
        List<ReportModel.Section> all = new ArrayList<>(sections);
        all.addAll(other.sections);
        String text = console.isEmpty() ? other.console
                : other.console.isEmpty() ? console : console + "\n" + other.console;
        return new ModeOutput(text, summary.andThen(other.summary), all, m -> other.model.apply(model.apply(m)));
    }
}
