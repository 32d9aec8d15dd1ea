/**
 * The parts a bank is built from: {@link breakwater.catalog.Part} (SI values, effective
 * capacitance after DC-bias retention), {@link breakwater.catalog.Catalog}, and the readers of the parts
 * catalog and of bank files (CSV, with every problem located by line and column).
 *
 * <p>May use {@code units} and {@code diagnostic}; Commons CSV is read here.
 *
 * <p>Read: {@code docs/file-contracts.md} (parts catalog, bank).
 */
package breakwater.catalog;
