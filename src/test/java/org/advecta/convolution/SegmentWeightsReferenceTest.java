package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.advecta.testing.FixtureAudit;
import org.advecta.testing.ReferenceTable;
import org.junit.jupiter.api.Test;

/**
 * The engine's hat-function weight rising(m, h) against mpmath quadrature, on both sides of
 * each switch (h = ½, 4|m|h = 1, m − h = 0) and in the far tails. The rows are exact
 * doubles m and h, so only the engine's own rounding counts: the contract is 32 + 4κ
 * units of 2⁻⁵³ relative, κ ≤ 2·max(y²) + 2 over the segment (y² ≤ 1600).
 */
class SegmentWeightsReferenceTest {

    private static final String DIR = "fixtures/convolution/";
    private static final double U = 0x1.0p-53;

    @Test
    void weightsWithinTheContract() {
        final ReferenceTable table = ReferenceTable.load(DIR + "segment_weights.csv");
        FixtureAudit.checkProvenance(table, "gen_convolution.py", DIR);
        double worst = 0;
        double worstFraction = 0;
        for (ReferenceTable.Row r : table.rows()) {
            final double m = r.getDouble("m");
            final double h = r.getDouble("h");
            final double v = SegmentIntegrals.rising(m, h);
            final BigDecimal exact = r.value();
            final double ref = exact.doubleValue();
            final double err = Math.abs(new BigDecimal(v).subtract(exact,
                MathContext.DECIMAL128).doubleValue());
            if (r.flag() != ReferenceTable.Flag.NORMAL) {
                assertTrue(err <= 4 * Double.MIN_VALUE, r.line() + " got " + v);
                continue;
            }
            final double y = Math.min(40, Math.min(Math.abs(m - h), Math.abs(m + h)));
            final double kappa = 2 * y * y + 2;
            final double units = err / (Math.abs(ref) * U);
            worst = Math.max(worst, units);
            worstFraction = Math.max(worstFraction, units / (32 + 4 * kappa));
            assertTrue(units <= 32 + 4 * kappa, r.line() + " got " + v + " (" + units + " units)");
        }
        System.out.printf("segment weights: %d rows, worst %.3g units of 2^-53, worst fraction "
            + "of the contract %.3g%n", table.rows().size(), worst, worstFraction);
        assertTrue(table.rows().size() >= 100);
    }
}
