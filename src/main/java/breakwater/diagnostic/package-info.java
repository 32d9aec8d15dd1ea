/**
 * Problems in input files, reported the way a compiler reports them:
 * {@link breakwater.diagnostic.Diagnostic} ({@code file:line:column: what is wrong, the rule. Maybe …}),
 * {@link breakwater.diagnostic.Diagnostics} to collect every problem of a file,
 * {@link breakwater.diagnostic.InputException} to carry them (exit code 3), "did you mean" hints, and
 * UTF-8 reading that locates a bad byte.
 *
 * <p>Depends on no other Breakwater package and on no framework.
 *
 * <p>Read: {@code docs/file-contracts.md}, {@code docs/architecture.md} (house-style files).
 */
package breakwater.diagnostic;
