package breakwater.design;

import breakwater.network.AntiResonance;
import breakwater.network.ImpedanceMetrics;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The one verdict of a run: whether the bank meets the spec, why not (as values), whether the run's own
 * condition holds (a margin asked for, a cost-down that loses nothing, every footprint of a comparison),
 * the margin to the limits, and a caution when a pass may not survive part spread. Console, summary.json,
 * the report and the exit code all read this value; the words are the reporters' business.
 *
 * <p>The rule for "meets the spec" is {@link #meetsSpec(double, double, int, boolean)}: the solver's fast
 * {@link Judgement} and the full {@link Evaluation} both go through it.
 *
 * @param bankMeetsSpec  the bank alone meets the spec: worst case inside the band, board limits kept,
 *                       |Z| under the target when the scenario requires it
 * @param reasons        why the bank does not meet the spec, in a fixed order (empty when it does)
 * @param modeFailures   the run's own conditions that are not met (empty when all are)
 * @param marginV        the worst case's smallest distance to either limit; negative when one is crossed
 * @param caution        present when the worst case stays inside the band but may not in production
 */
public record Verdict(boolean bankMeetsSpec, List<Reason> reasons, List<ModeCondition> modeFailures, double marginV,
                      Optional<Caution> caution) {

    /**
     * A passing worst case closer to a limit than this share of the allowance (the smaller of the room
     * below and above the operating point) is cautioned: part-to-part spread alone can use it up. The 5 % is
     * this project's own choice, not a published figure.
     */
    public static final double THIN_MARGIN_SHARE = 0.05;

    /**
     * Below this Monte Carlo yield a passing bank is cautioned whatever its nominal margin (this project's
     * own policy).
     */
    public static final double YIELD_CAUTION = 0.95;

    public Verdict {
        reasons = List.copyOf(reasons);
        modeFailures = List.copyOf(modeFailures);
        Objects.requireNonNull(caution, "caution");
        if (bankMeetsSpec && !reasons.isEmpty()) {
            throw new IllegalArgumentException("a bank that meets the spec has no reasons against it");
        }
    }

    /** Why a run does not meet the spec. */
    public sealed interface Reason {
    }

    /**
     * The worst-case minimum voltage falls {@code excessV} below the lower limit.
     *
     * @param largestAntiResonance the anti-resonance with the highest |Z| in the band, if any
     * @param targetOhms           the target impedance, to say how high it is
     */
    public record DroopBelowLimit(double excessV, Optional<AntiResonance> largestAntiResonance, double targetOhms)
            implements Reason {
    }

    /** The worst-case maximum voltage rises {@code excessV} above the upper limit. */
    public record OvershootAboveLimit(double excessV) implements Reason {
    }

    /** A board limit (max_parts, max_distinct, max_per_case) is broken. */
    public record BoardLimitBroken(BoardCheck.Violation violation) implements Reason {
    }

    /** |Z| rises above the target in the band, and the scenario requires it to stay under. */
    public record OverTarget(double peakOverTarget) implements Reason {
    }

    /** A condition of the run itself, besides the spec. */
    public sealed interface ModeCondition extends Reason {
    }

    /** The run asked for a design margin and the bank keeps less. */
    public record MarginNotKept(double keptV, double requiredV, String source) implements ModeCondition {
    }

    /** A cost-down whose result has a worse worst droop or overshoot than the bank it started from. */
    public record TrimLostMargin() implements ModeCondition {
    }

    /** A comparison in which these footprints' banks do not meet the spec. */
    public record FootprintsFailing(List<String> names) implements ModeCondition {
        public FootprintsFailing {
            names = List.copyOf(names);
        }
    }

    /** Why a pass may not hold in production. */
    public sealed interface Caution {
        /** The nominal margin. */
        double marginV();

        /** Whether the run already asked for a design margin (so more of one is the advice). */
        boolean marginAsked();
    }

    /** No Monte Carlo run, and the margin is under {@link #THIN_MARGIN_SHARE} of the allowance. */
    public record ThinMargin(double marginV, double allowanceV, boolean marginAsked) implements Caution {
    }

    /** After a Monte Carlo run, fewer than {@link #YIELD_CAUTION} of the samples met the spec. */
    public record LowYield(double marginV, double yieldFraction, boolean marginAsked) implements Caution {
    }

    /** The whole run meets the spec: the bank does and every condition of the run holds. */
    public boolean meetsSpec() {
        return bankMeetsSpec && modeFailures.isEmpty();
    }

    /** The bank meets the spec, but a condition of the run does not hold. */
    public boolean onlyTheRunFails() {
        return bankMeetsSpec && !modeFailures.isEmpty();
    }

    /** The worst case stays inside the band: neither excess is positive. */
    public static boolean insideBand(double droopExcessV, double overshootExcessV) {
        return droopExcessV <= 0 && overshootExcessV <= 0;
    }

    /**
     * The spec: the worst case inside the band, no board limit broken, and |Z| not over the target where the
     * scenario requires it ({@code overTarget} is false when it does not). The only copy of the rule.
     *
     * @param boardExcess parts (or part types) beyond the board limits, summed over the limits
     */
    public static boolean meetsSpec(double droopExcessV, double overshootExcessV, int boardExcess, boolean overTarget) {
        return insideBand(droopExcessV, overshootExcessV) && boardExcess == 0 && !overTarget;
    }

    /** Whether a fully evaluated bank meets the spec (against its judge's limits). */
    public static boolean meetsSpec(Evaluation e, boolean requireTarget) {
        return meetsSpec(e.figures().droopExcessV(), e.figures().overshootExcessV(), boardExcess(e.board()),
                requireTarget && !e.impedance().underTarget());
    }

    /** The bank's verdict alone: no condition of a run, no Monte Carlo run, no margin asked for. */
    public static Verdict of(Evaluation e, boolean requireTarget) {
        return of(e, requireTarget, List.of(), OptionalDouble.empty(), false);
    }

    /**
     * The verdict of a run that shows {@code e}.
     *
     * @param modeFailures the run's own conditions that do not hold
     * @param yield        the Monte Carlo yield (0 .. 1) when the run drew samples
     * @param marginAsked  whether the run asked for a design margin
     */
    public static Verdict of(Evaluation e, boolean requireTarget, List<? extends ModeCondition> modeFailures,
                             OptionalDouble yield, boolean marginAsked) {
        return of(e.figures(), e.board(), e.impedance(), requireTarget, modeFailures, yield, marginAsked);
    }

    /** As {@link #of(Evaluation, boolean, List, OptionalDouble, boolean)}, from the figures it reads. */
    public static Verdict of(WorstCaseVolts wc, List<BoardCheck.Violation> board, ImpedanceMetrics impedance,
                             boolean requireTarget, List<? extends ModeCondition> modeFailures, OptionalDouble yield,
                             boolean marginAsked) {
        boolean overTarget = requireTarget && !impedance.underTarget();
        boolean meets = meetsSpec(wc.droopExcessV(), wc.overshootExcessV(), boardExcess(board), overTarget);
        List<Reason> reasons = new ArrayList<>();
        if (!meets) {
            if (wc.droopExcessV() > 0) {
                reasons.add(new DroopBelowLimit(wc.droopExcessV(), impedance.antiResonances().stream()
                        .max(Comparator.comparingDouble(AntiResonance::impedanceOhms)), impedance.targetOhms()));
            }
            if (wc.overshootExcessV() > 0) {
                reasons.add(new OvershootAboveLimit(wc.overshootExcessV()));
            }
            for (BoardCheck.Violation v : board) {
                reasons.add(new BoardLimitBroken(v));
            }
            if (overTarget) {
                reasons.add(new OverTarget(impedance.peakOverTarget()));
            }
        }
        return new Verdict(meets, reasons, List.copyOf(modeFailures), wc.marginV(), caution(wc, yield, marginAsked));
    }

    /**
     * The caution on a worst case inside the band: after a Monte Carlo run, a yield under
     * {@link #YIELD_CAUTION} whatever the nominal margin; without one, a margin under
     * {@link #THIN_MARGIN_SHARE} of the allowance. A worst case outside the band has its reasons instead.
     */
    public static Optional<Caution> caution(WorstCaseVolts wc, OptionalDouble yield, boolean marginAsked) {
        if (!wc.passes()) {
            return Optional.empty();
        }
        if (yield.isPresent()) {
            return yield.getAsDouble() < YIELD_CAUTION
                    ? Optional.of(new LowYield(wc.marginV(), yield.getAsDouble(), marginAsked)) : Optional.empty();
        }
        double allowance = Math.min(wc.operatingV() - wc.lowerLimitV(), wc.upperLimitV() - wc.operatingV());
        return wc.marginV() < THIN_MARGIN_SHARE * allowance
                ? Optional.of(new ThinMargin(wc.marginV(), allowance, marginAsked)) : Optional.empty();
    }

    private static int boardExcess(List<BoardCheck.Violation> board) {
        int excess = 0;
        for (BoardCheck.Violation v : board) {
            excess += v.excess();
        }
        return excess;
    }
}
