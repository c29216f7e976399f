/**
 * The command line: {@code advecta list}, {@code advecta eval}, {@code advecta run},
 * {@code advecta fit} and {@code advecta check}.
 *
 * <p>Not exported from the module: it is an application, shipped as the runnable jar
 * (classifier {@code cli}) together with its libraries (picocli, Jackson's TOML reader,
 * Commons CSV, JFreeChart, Batik's SVG generator), which are optional dependencies of the library and
 * never reach its consumers.
 *
 * <p>Families are described once, in {@code Families}: a name, a summary, the domain, the
 * number of dimensions, the parameter specs (key, meaning, default, range) and a factory of
 * the field from validated parameters. {@code list} prints them, {@code eval} validates
 * {@code key=value} arguments against them, {@code run} reads a scenario's {@code [medium]}
 * and {@code [source]} tables with the same keys, {@code fit} and {@code check} take the
 * same {@code key=value} arguments (for {@code fit}: fixed values and starting values).
 * The continuous sources ({@code PlumeFamilies}) and the solutions next to a wall
 * ({@code HalfSpaceFamilies}) are registered there from their own classes.
 *
 * <p>User errors (unknown family or key, missing or malformed values, malformed CSV lines,
 * out-of-range scenario values, unreadable files) end with one line on standard error and
 * exit status 2 ({@code fit} exits with 3 when the fit itself fails, after writing its
 * report); output files are written to a temporary file and moved into place, so an
 * interrupted or failed command leaves no partial file under the final name.
 */
package org.advecta.cli;
