/**
 * Engineering notation in and out: reading values such as {@code 4u7}, {@code 100nF},
 * {@code 0.5 mOhm} or {@code 3 %} into SI doubles with the unit checked against the quantity
 * ({@link breakwater.units.EngineeringNotation}, {@link breakwater.units.Quantity}), printing them back
 * with SI prefixes, and the form of a case code ({@link breakwater.units.CaseCode}). Everything inside
 * Breakwater is SI; notation appears only at the edges, where files are read and text is printed.
 *
 * <p>Depends on no other Breakwater package and on no framework.
 *
 * <p>Read: {@code docs/file-contracts.md} (values in input files).
 */
package breakwater.units;
