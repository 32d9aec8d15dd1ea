package breakwater.cli;

import breakwater.design.Verdict;
import breakwater.report.ReportModel;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import java.util.function.Consumer;
import java.util.function.UnaryOperator;

/**
 * What a mode adds to the common output of {@link Results#emit}: report sections, summary.json keys,
 * console text (printed before the verdict), a change to the report model (e.g. overlaid curves), and what
 * the verdict needs from the mode: its own conditions not met, a Monte Carlo yield, a margin asked for.
 *
 * @param sections       extra report sections, in order
 * @param summary        adds keys to summary.json
 * @param console        text printed after the bank's summary, before the verdict ("" for none)
 * @param model          applied to the report model before it is written
 * @param failures       the mode's own conditions that do not hold
 * @param yield          the Monte Carlo yield, when samples were drawn
 * @param marginAsked    whether the run asked for a design margin
 */
record RunExtras(List<ReportModel.Section> sections, Consumer<ObjectNode> summary, String console,
                 UnaryOperator<ReportModel> model, List<Verdict.ModeCondition> failures, OptionalDouble yield,
                 boolean marginAsked) {

    RunExtras {
        sections = List.copyOf(sections);
        Objects.requireNonNull(summary, "summary");
        Objects.requireNonNull(console, "console");
        Objects.requireNonNull(model, "model");
        failures = List.copyOf(failures);
        Objects.requireNonNull(yield, "yield");
    }

    static final RunExtras NONE = of(List.of(), s -> { }, "");

    static RunExtras of(List<ReportModel.Section> sections, Consumer<ObjectNode> summary, String console) {
        return new RunExtras(sections, summary, console, m -> m, List.of(), OptionalDouble.empty(), false);
    }

    RunExtras withModel(UnaryOperator<ReportModel> change) {
        return new RunExtras(sections, summary, console, change, failures, yield, marginAsked);
    }

    RunExtras withFailure(boolean met, Verdict.ModeCondition whyNot) {
        return met ? this : new RunExtras(sections, summary, console, model, List.of(whyNot), yield, marginAsked);
    }

    RunExtras withYield(double fraction) {
        return new RunExtras(sections, summary, console, model, failures, OptionalDouble.of(fraction), marginAsked);
    }

    RunExtras withMarginAsked() {
        return new RunExtras(sections, summary, console, model, failures, yield, true);
    }

    /** Both, this one first. */
    RunExtras plus(RunExtras other) {
        List<ReportModel.Section> all = new ArrayList<>(sections);
        all.addAll(other.sections);
        String text = console.isEmpty() ? other.console
                : other.console.isEmpty() ? console : console + "\n" + other.console;
        List<Verdict.ModeCondition> why = new ArrayList<>(failures);
        why.addAll(other.failures);
        return new RunExtras(all, summary.andThen(other.summary), text, m -> other.model.apply(model.apply(m)), why,
                yield.isPresent() ? yield : other.yield, marginAsked || other.marginAsked);
    }
}
