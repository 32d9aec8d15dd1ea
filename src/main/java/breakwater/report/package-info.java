/**
 * What a run writes for people and for other tools: the CSV files, summary.json, the console
 * text, the self-contained HTML report, and the atomic writing of every file into {@code --out}
 * ({@link breakwater.report.OutputDirectory}).
 *
 * <p>May use the packages before it ({@code units} … {@code optimize}) and its charts package; Jackson (JSON)
 * and Commons CSV are allowed here.
 *
 * <p>Read: {@code docs/file-contracts.md}, {@code docs/architecture.md} (the golden-output test).
 */
package breakwater.report;
