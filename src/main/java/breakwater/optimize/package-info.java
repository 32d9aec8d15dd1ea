/**
 * The search for the cheapest bank that meets the spec: the Timefold model
 * ({@code BankPlan}, {@code PartCount}, {@code ScoreLevels}), its start phases, moves and restarts,
 * several seeded solvers in {@link breakwater.optimize.BankSearch}, the judgement memo
 * {@link breakwater.optimize.JudgePool}, and the cost-down and cost-against-excursion searches built on
 * it. No Timefold type appears in its public API.
 *
 * <p>May use the packages before it ({@code units} … {@code design}); the only package that imports Timefold
 * Solver.
 *
 * <p>Read: {@code docs/search.md}.
 */
package breakwater.optimize;
