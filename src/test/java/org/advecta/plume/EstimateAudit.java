package org.advecta.plume;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.advecta.quadrature.Estimate;
import org.advecta.testing.ReferenceTable.Flag;
import org.advecta.testing.ReferenceTable.Row;

/**
 * Collects the checks of quadrature results against a reference file, row by row: the exact
 * value lies within the returned bound; where required, the bound is at most
 * {@link #MAX_RELATIVE_ESTIMATE} of the value (the contract at default settings); a
 * row whose exact value is 0 gives exactly 0. {@link #finish} prints the worst cases and fails
 * with every failure listed.
 */
final class EstimateAudit {

    /** The bound on the returned relative error estimate at default settings. */
    static final double MAX_RELATIVE_ESTIMATE = 1e-10;

    private final String file;
    private final List<String> failures = new ArrayList<>();
    private double worstActual;
    private double worstBound;
    private int normal;
    private int zero;
    private int boundChecked;

    EstimateAudit(String file) {
        this.file = file;
    }

    /**
     * Checks one row.
     *
     * @param r the reference row (flag NORMAL or ZERO)
     * @param e the library's estimate for it
     * @param boundRequired whether the bound must be at most 1e-10 relative on this row
     */
    void check(Row r, Estimate e, boolean boundRequired) {
        final String where = " at " + r.caseTag();
        if (!Double.isFinite(e.value()) || !Double.isFinite(e.error())) {
            failures.add("not finite: " + e + where);
            return;
        }
        if (r.flag() == Flag.ZERO) {
            if (e.value() != 0.0) {
                failures.add("exact value 0, got " + e + where);
            }
            zero++;
            return;
        }
        assertTrue(r.flag() == Flag.NORMAL, "every other row is a normal double: " + r);
        final BigDecimal exact = r.value();
        final double actual = new BigDecimal(e.value()).subtract(exact).abs()
            .divide(exact.abs(), MathContext.DECIMAL64).doubleValue();
        final double allowed = e.error() / exact.abs().doubleValue();
        if (!(actual <= allowed)) {
            failures.add(String.format(Locale.ROOT,
                "error %.3g relative exceeds the returned bound %.3g: %s%s", actual, allowed, e,
                where));
        }
        normal++;
        if (boundRequired) {
            boundChecked++;
            worstActual = Math.max(worstActual, actual);
            worstBound = Math.max(worstBound, allowed);
            if (!(allowed <= MAX_RELATIVE_ESTIMATE)) {
                failures.add(String.format(Locale.ROOT, "returned bound %.3g > %.0e relative: %s%s",
                    allowed, MAX_RELATIVE_ESTIMATE, e, where));
            }
        }
    }

    /**
     * Prints the worst cases and fails on any failure or too few rows.
     *
     * @param minNormal least number of rows with a normal exact value
     * @param minZero least number of rows whose exact value is 0
     * @param minBoundChecked least number of rows held to the 1e-10 bound
     */
    void finish(int minNormal, int minZero, int minBoundChecked) {
        System.out.println(String.format(Locale.ROOT,
            "%s: %d rows (%d exactly 0), %d held to the bound: worst actual relative error %.3g,"
                + " worst returned bound %.3g", file, normal + zero, zero, boundChecked,
            worstActual, worstBound));
        assertTrue(normal >= minNormal && zero >= minZero && boundChecked >= minBoundChecked,
            "rows: " + normal + " normal, " + zero + " zero, " + boundChecked + " bound-checked");
        assertTrue(failures.isEmpty(), () -> failures.size() + " failures:\n"
            + String.join("\n", failures));
    }
}
