package org.advecta.solution;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.advecta.quadrature.Estimate;
import org.advecta.testing.FixtureAudit;
import org.advecta.testing.FixtureCheck;
import org.advecta.testing.FixtureCheck.Tolerance;
import org.advecta.testing.ReferenceTable;
import org.advecta.testing.ReferenceTable.Flag;
import org.advecta.testing.ReferenceTable.Row;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * The ramp responses against ramp_inlet.csv (gen_ramp.py: mpmath Duhamel quadrature of the
 * impulse responses at 45+ digits, an independent route; closed forms checked against it
 * and against numerical Laplace inversion there). Closed forms are held to the class's
 * contract, max(16, 2κ) ULP; the third type with decay (quadrature) to its estimate.
 */
class InletRampReferenceTest {

    private static final String DIR = "fixtures/solution/";
    private static final Tolerance CONTRACT = Tolerance.conditioned(16, 2);

    private static InletRamp ramp(Row r) {
        final TransportParameters p = TransportParameters.of(r.getDouble("v"), r.getDouble("D"))
            .withRetardation(r.getDouble("R")).withDecay(r.getDouble("mu"));
        return r.get("inlet").equals("third") ? InletRamp.thirdType(p) : InletRamp.firstType(p);
    }

    @Test
    void closedFormsMatchTheReference() {
        final ReferenceTable table = ReferenceTable.load(DIR + "ramp_inlet.csv");
        FixtureAudit.checkProvenance(table, "gen_ramp.py", DIR);
        FixtureAudit.checkCoverage(table, FixtureAudit.leastRows(230, 8, 26, 0));
        final FixtureCheck check = new FixtureCheck(table, CONTRACT).withConditionedSubnormals();
        int closed = 0;
        for (Row r : table.rows()) {
            final InletRamp w = ramp(r);
            if (w.isClosedForm()) {
                check.check(r, r.get("inlet"), w.value(r.getDouble("x"), r.getDouble("t")));
                closed++;
            }
        }
        check.finish();
        assertTrue(closed >= 200, "closed-form rows: " + closed);
    }

    @Test
    void decayingFluxInletIsWithinItsEstimate() {
        final ReferenceTable table = ReferenceTable.load(DIR + "ramp_inlet.csv");
        int rows = 0;
        double worst = 0;
        for (Row r : table.rows()) {
            final InletRamp w = ramp(r);
            if (w.isClosedForm() || r.flag() != Flag.NORMAL) {
                continue;
            }
            final Estimate e = w.valueWithError(r.getDouble("x"), r.getDouble("t"));
            final BigDecimal exact = r.value();
            final double err = Math.abs(new BigDecimal(e.value()).subtract(exact,
                MathContext.DECIMAL128).doubleValue());
            // the estimate, plus the step response's own contract carried through the
            // integral of a positive function: max(16, 2κ) ULP of the result
            final double ulp = Math.ulp(exact.doubleValue());
            final double allowed = e.error() + Math.max(16, 2 * r.cond()) * ulp;
            worst = Math.max(worst, err / allowed);
            assertTrue(err <= allowed, r.line() + " got " + e + " error " + err);
            // the estimate (sum of the differences between levels of bisection) is
            // conservative; it must still be small
            assertTrue(e.error() <= 1e-10 * exact.doubleValue(), r.line() + " estimate " + e);
            rows++;
        }
        System.out.printf("ramp fixture, third type with decay: %d rows, worst error/allowed"
            + " %.3g%n", rows, worst);
        assertTrue(rows >= 5, "rows: " + rows);
    }
}
