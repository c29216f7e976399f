package org.advecta.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;

/**
 * The error of a computed double against an exact decimal reference, in units in the last
 * place (ULP) of the reference: |computed − exact| / Math.ulp(exact rounded to double), the
 * difference formed exactly in {@link BigDecimal}.
 *
 * <p>{@link Summary} collects the errors of one fixture file (max and median) and writes
 * them to {@code target/accuracy/}. Setting the system property
 * {@code advecta.fixtures.report=true} switches the fixture tests to report-only mode: every
 * row's error is printed and nothing fails. That mode is for measuring an implementation
 * before a tolerance is set, never for passing a build.
 */
public final class UlpError {

    /** System property that switches the fixture tests to report-only mode. */
    public static final String REPORT_PROPERTY = "advecta.fixtures.report";

    private static final MathContext CONTEXT = MathContext.DECIMAL64;
    private static final BigDecimal MIN_VALUE = new BigDecimal(Double.MIN_VALUE);

    private UlpError() {
    }

    /**
     * Returns whether report-only mode is on ({@code -Dadvecta.fixtures.report=true}).
     *
     * @return true to print every row's error instead of failing
     */
    public static boolean reportOnly() {
        return Boolean.getBoolean(REPORT_PROPERTY);
    }

    /**
     * Returns the error of {@code computed} in ULP of {@code exact} rounded to double.
     *
     * @param computed the computed value
     * @param exact the exact value, whose magnitude should be at least
     *     {@link Double#MIN_NORMAL} (below it one ULP is {@link Double#MIN_VALUE})
     * @return the error in ULP, +∞ if computed is NaN or infinite
     */
    public static double ulps(double computed, BigDecimal exact) {
        if (!Double.isFinite(computed)) {
            return Double.POSITIVE_INFINITY;
        }
        final double rounded = exact.doubleValue();
        final double ulp = Double.isInfinite(rounded) ? Math.ulp(Double.MAX_VALUE)
            : Math.ulp(rounded);
        return new BigDecimal(computed).subtract(exact).abs()
            .divide(new BigDecimal(ulp), CONTEXT).doubleValue();
    }

    /**
     * Returns the absolute error of {@code computed} in units of {@link Double#MIN_VALUE}.
     *
     * @param computed the computed value
     * @param exact the exact value
     * @return |computed − exact| / MIN_VALUE, +∞ if computed is NaN or infinite
     */
    public static double minValues(double computed, BigDecimal exact) {
        if (!Double.isFinite(computed)) {
            return Double.POSITIVE_INFINITY;
        }
        return new BigDecimal(computed).subtract(exact).abs()
            .divide(MIN_VALUE, CONTEXT).doubleValue();
    }

    /**
     * Describes a double for a failure message: shortest decimal and hexadecimal.
     *
     * @param x the value
     * @return e.g. {@code 0.1 (0x1.999999999999ap-4)}
     */
    public static String describe(double x) {
        return x + " (" + Double.toHexString(x) + ")";
    }

    /**
     * Formats an error for a message or report line.
     *
     * @param e an error (ULP or MIN_VALUE units)
     * @return a short decimal
     */
    public static String format(double e) {
        return String.format(Locale.ROOT, "%.3g", e);
    }

    /**
     * The errors of the rows of one fixture file: max and median ULP over the rows whose exact
     * value is a normal double, the max over those of them with κ ≤ 8 (where the error cannot
     * be blamed on the conditioning), and the largest ratio of error to tolerance.
     */
    public static final class Summary {
        /** Rows with κ at most this count as well conditioned in the summary. */
        public static final double WELL_CONDITIONED = 8;

        private final String file;
        private final int rows;
        private int checks;
        private double[] errors = new double[64];
        private int count;
        private double max;
        private double maxWellConditioned;
        private double maxRatio;
        private String worst = "";

        /**
         * Starts a summary.
         *
         * @param file the fixture file name, e.g. {@code erfc.csv}
         * @param rows the number of rows in the file
         */
        public Summary(String file, int rows) {
            this.file = file;
            this.rows = rows;
        }

        /** Counts one check of a computed value against a row (of any flag). */
        public void countCheck() {
            checks++;
        }

        /**
         * Adds the ULP error of a row whose exact value is a normal double.
         *
         * @param ulps the error
         * @param tolerance the row's tolerance in ULP
         * @param cond the row's condition number κ
         * @param where the row, for the worst-case note
         */
        public void add(double ulps, double tolerance, double cond, String where) {
            if (count == errors.length) {
                errors = Arrays.copyOf(errors, 2 * count);
            }
            errors[count++] = ulps;
            if (ulps > max || count == 1) {
                max = ulps;
                worst = where;
            }
            if (cond <= WELL_CONDITIONED) {
                maxWellConditioned = Math.max(maxWellConditioned, ulps);
            }
            maxRatio = Math.max(maxRatio, ulps / tolerance);
        }

        /**
         * Returns the number of rows in the file.
         *
         * @return the row count
         */
        public int rows() {
            return rows;
        }

        /**
         * Returns the number of checks made (a row can be checked against several methods).
         *
         * @return the check count
         */
        public int checks() {
            return checks;
        }

        /**
         * Returns the largest ULP error over normal rows.
         *
         * @return the maximum (0 when there are none)
         */
        public double max() {
            return max;
        }

        /**
         * Returns the median ULP error over normal rows.
         *
         * @return the median (0 when there are none)
         */
        public double median() {
            if (count == 0) {
                return 0;
            }
            final double[] s = Arrays.copyOf(errors, count);
            Arrays.sort(s);
            return count % 2 == 1 ? s[count / 2] : 0.5 * (s[count / 2 - 1] + s[count / 2]);
        }

        /**
         * Returns the one-line summary: file, rows, checks, max and median ULP (over the
         * checks of normal rows), max ULP where κ ≤ 8, the largest error-to-tolerance ratio
         * and the line of the max.
         *
         * @return the line
         */
        public String line() {
            return String.format(Locale.ROOT,
                "%s rows=%d checks=%d normal_checks=%d max_ulp=%s median_ulp=%s "
                    + "max_ulp_cond_le_8=%s max_error_over_tolerance=%s max_at=%s",
                file, rows, checks, count, format(max()), format(median()),
                format(maxWellConditioned), format(maxRatio), worst.replace(' ', '_'));
        }

        /**
         * Writes {@link #line()} to {@code target/accuracy/<base name>.txt} under the
         * project directory (the {@code basedir} system property Maven sets, else the
         * working directory).
         *
         * @return the file written
         */
        public Path write() {
            final String base = file.endsWith(".csv")
                ? file.substring(0, file.length() - 4) : file;
            final Path dir = Path.of(System.getProperty("basedir", "."), "target", "accuracy");
            final Path out = dir.resolve(base + ".txt");
            try {
                Files.createDirectories(dir);
                Files.writeString(out, line() + System.lineSeparator(), StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new UncheckedIOException("cannot write " + out, e);
            }
            return out;
        }
    }
}
