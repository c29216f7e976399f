package org.advecta.testing;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.advecta.testing.ReferenceTable.Flag;
import org.advecta.testing.ReferenceTable.Row;

/**
 * Judges computed values against the rows of one {@link ReferenceTable}, by the rules of the
 * fixture tests:
 *
 * <ul>
 *   <li>no NaN or infinity, ever;
 *   <li>{@code normal} rows: within the row's ULP tolerance ({@link Tolerance});
 *   <li>{@code subnormal} rows: within 4 × {@link Double#MIN_VALUE} absolute, or, for files
 *       checked {@link #withConditionedSubnormals() with conditioned subnormals}, within
 *       max(4 × MIN_VALUE, 2κ·2⁻⁵³·|exact|): the relative bound of normal rows carried into
 *       the subnormal range;
 *   <li>{@code underflow} rows: 0, or at most {@link Double#MIN_VALUE} in magnitude;
 *   <li>{@code zero} rows: exactly 0.
 * </ul>
 *
 * <p>Every failure is collected; {@link #finish()} writes the file's summary and then fails
 * with all of them, printing the computed value in decimal and hexadecimal and the row. In
 * report-only mode ({@link UlpError#reportOnly()}) every row is printed and nothing fails.
 */
public final class FixtureCheck {

    /** Absolute tolerance of subnormal rows, in units of {@link Double#MIN_VALUE}. */
    public static final double SUBNORMAL_MIN_VALUES = 4;

    private static final int MAX_LISTED = 60;

    /** The ULP tolerance of a normal row. */
    @FunctionalInterface
    public interface Tolerance {
        /**
         * Returns the allowed error of a row, in ULP.
         *
         * @param row the row
         * @return the tolerance
         */
        double ulps(Row row);

        /**
         * A fixed tolerance.
         *
         * @param ulps the tolerance in ULP
         * @return the tolerance
         */
        static Tolerance fixed(double ulps) {
            return row -> ulps;
        }

        /**
         * The tolerance max(floor, perCond × κ), with κ the row's {@code cond} column.
         *
         * @param floor the least tolerance in ULP
         * @param perCond ULP allowed per unit of condition number
         * @return the tolerance
         */
        static Tolerance conditioned(double floor, double perCond) {
            return row -> Math.max(floor, perCond * row.cond());
        }
    }

    private final ReferenceTable table;
    private final Tolerance tolerance;
    private final UlpError.Summary summary;
    private final List<String> failures = new ArrayList<>();
    private final boolean report = UlpError.reportOnly();
    private boolean conditionedSubnormals;

    /**
     * Starts checking a table.
     *
     * @param table the fixture
     * @param tolerance the ULP tolerance of its normal rows
     */
    public FixtureCheck(ReferenceTable table, Tolerance tolerance) {
        this.table = table;
        this.tolerance = tolerance;
        this.summary = new UlpError.Summary(table.fileName(), table.rows().size());
    }

    /**
     * Judges subnormal rows by max(4 × MIN_VALUE, 2κ·2⁻⁵³·|exact|) instead of 4 × MIN_VALUE:
     * for solutions whose subnormal values come from arguments rounded with relative error
     * 2⁻⁵³, which κ amplifies (used where the issue states no subnormal rule).
     *
     * @return this check
     */
    public FixtureCheck withConditionedSubnormals() {
        this.conditionedSubnormals = true;
        return this;
    }

    /**
     * Judges one computed value against its row.
     *
     * @param row the row
     * @param what what was computed, e.g. the method name (for messages)
     * @param computed the computed value
     */
    public void check(Row row, String what, double computed) {
        summary.countCheck();
        final Flag flag = row.flag();
        String problem = null;
        String measure;
        if (!Double.isFinite(computed)) {
            measure = "not finite";
            problem = "NaN or infinite result";
        } else {
            switch (flag) {
                case NORMAL: {
                    final BigDecimal exact = row.value();
                    final double e = UlpError.ulps(computed, exact);
                    final double tol = tolerance.ulps(row);
                    summary.add(e, tol, row.cond(), "line " + row.lineNumber());
                    measure = UlpError.format(e) + " ULP (tolerance " + UlpError.format(tol)
                        + ", cond " + row.get("cond") + ")";
                    if (!(e <= tol)) {
                        problem = "error " + UlpError.format(e) + " ULP > "
                            + UlpError.format(tol) + " ULP";
                    }
                    break;
                }
                case SUBNORMAL: {
                    final double e = UlpError.minValues(computed, row.value());
                    final double allowed = conditionedSubnormals
                        ? Math.max(SUBNORMAL_MIN_VALUES, 2 * row.cond() * 0x1.0p-53
                            * Math.abs(row.value().doubleValue()) / Double.MIN_VALUE)
                        : SUBNORMAL_MIN_VALUES;
                    measure = UlpError.format(e) + " MIN_VALUE";
                    if (!(e <= allowed)) {
                        problem = "error " + UlpError.format(e) + " MIN_VALUE > "
                            + UlpError.format(allowed) + " MIN_VALUE";
                    }
                    break;
                }
                case UNDERFLOW:
                    measure = computed == 0 ? "0" : "|result| / MIN_VALUE = "
                        + UlpError.format(Math.abs(computed) / Double.MIN_VALUE);
                    if (!(Math.abs(computed) <= Double.MIN_VALUE)) {
                        problem = "exact value underflows but result exceeds MIN_VALUE";
                    }
                    break;
                case ZERO:
                    measure = computed == 0 ? "0" : "nonzero";
                    if (computed != 0) {
                        problem = "exact value is 0 but result is not";
                    }
                    break;
                default:
                    throw new IllegalStateException(flag.toString());
            }
        }
        if (report) {
            System.out.println(String.format(Locale.ROOT, "%s %s %s computed=%s expected=%s %s",
                table.fileName(), what, measure, UlpError.describe(computed),
                row.get("value"), row));
        }
        if (problem != null) {
            failures.add(problem + ": " + what + " computed " + UlpError.describe(computed)
                + ", expected " + row.get("value") + " (" + flag.cell() + ", cond "
                + row.get("cond") + ") at " + row);
        }
    }

    /**
     * Returns the failures so far.
     *
     * @return the failure messages
     */
    public List<String> failures() {
        return failures;
    }

    /**
     * Returns the summary so far.
     *
     * @return the summary
     */
    public UlpError.Summary summary() {
        return summary;
    }

    /**
     * Writes the summary to {@code target/accuracy/} and, unless in report-only mode, throws
     * an {@link AssertionError} listing every failure.
     */
    public void finish() {
        summary.write();
        if (report) {
            System.out.println("summary: " + summary.line() + " failures=" + failures.size());
            return;
        }
        if (!failures.isEmpty()) {
            final StringBuilder sb = new StringBuilder();
            sb.append(failures.size()).append(" of ").append(summary.checks())
                .append(" checks fail in ").append(table.fileName()).append(" (reference: ")
                .append(reference(table)).append(")\n");
            for (int i = 0; i < Math.min(MAX_LISTED, failures.size()); i++) {
                sb.append("  ").append(failures.get(i)).append('\n');
            }
            if (failures.size() > MAX_LISTED) {
                sb.append("  ... and ").append(failures.size() - MAX_LISTED).append(" more\n");
            }
            sb.append(summary.line());
            throw new AssertionError(sb.toString());
        }
    }

    /**
     * Describes where a table's values come from, from its header, e.g. "mpmath 1.3.0 at 50
     * digits, generated by gen_special.py".
     *
     * @param table the fixture
     * @return the description
     */
    public static String reference(ReferenceTable table) {
        final String precision = table.header("working precision").orElse("?");
        final int semi = precision.indexOf(';');
        return "mpmath " + table.header("mpmath").orElse("?") + " at "
            + (semi > 0 ? precision.substring(0, semi) : precision) + ", generated by "
            + table.header("generator").orElse("?");
    }
}
