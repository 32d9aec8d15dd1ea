/**
 * Judging a bank on a rail: {@link breakwater.design.CapacitorBank},
 * {@link breakwater.design.BankEvaluator} (the single judge of a bank, used by every command and report),
 * its fast path for the solver {@link breakwater.design.CandidateJudge}, the worst case in volts against
 * the band ({@link breakwater.design.WorstCaseVolts}), cost, board limits and the Monte Carlo spread of
 * part values.
 *
 * <p>May use the packages before it ({@code units} … {@code timedomain}); no framework.
 *
 * <p>Read: {@code docs/worst-case.md} (the worst case in volts), {@code docs/search.md} (the solver's judge).
 */
package breakwater.design;
