package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.advecta.testing.FixtureAudit;
import org.advecta.testing.ReferenceTable;
import org.junit.jupiter.api.Test;

/**
 * The Gauss–Hermite rules (Newton on the recurrence, Press et al. 2007 §4.6.1) against
 * 50/60-digit mpmath nodes and weights (gauss_hermite.csv: mpmath Golub–Welsch polished on Hₙ,
 * weights by Abramowitz &amp; Stegun 25.4.46).
 */
class GaussHermiteTest {

    private static final String DIR = "fixtures/convolution/";

    @Test
    void nodesAndWeightsMatchMpmath() {
        final ReferenceTable table = ReferenceTable.load(DIR + "gauss_hermite.csv");
        FixtureAudit.checkProvenance(table, "gen_convolution.py", DIR);
        final int[] seen = new int[GaussHermite.ORDERS.length];
        double worstNodeUlps = 0;
        double worstWeightRel = 0;
        for (ReferenceTable.Row r : table.rows()) {
            final int n = Integer.parseInt(r.get("n"));
            int i = 0;
            while (GaussHermite.ORDERS[i] != n) {
                i++;
            }
            final int k = seen[i]++;
            final BigDecimal node = r.getDecimal("node");
            final double y = GaussHermite.node(i, k);
            final double nodeUlps = new BigDecimal(y).subtract(node).abs().doubleValue()
                / Math.ulp(node.doubleValue());
            final BigDecimal weight = r.value();
            final double wRel = new BigDecimal(GaussHermite.weight(i, k)).subtract(weight)
                .divide(weight, MathContext.DECIMAL64).abs().doubleValue();
            worstNodeUlps = Math.max(worstNodeUlps, nodeUlps);
            worstWeightRel = Math.max(worstWeightRel, wRel);
            assertTrue(nodeUlps <= 2, () -> r.line() + ": node " + y + " off by " + nodeUlps
                + " ulp");
            assertTrue(wRel <= 1e-13, () -> r.line() + ": weight relative error " + wRel);
        }
        for (int i = 0; i < seen.length; i++) {
            assertEquals(GaussHermite.ORDERS[i] / 2, seen[i], "rows of order "
                + GaussHermite.ORDERS[i]);
            assertEquals(seen[i], GaussHermite.halfSize(i));
        }
        System.out.printf("Gauss-Hermite: worst node error %.3g ulp, worst weight error %.3g "
            + "relative%n", worstNodeUlps, worstWeightRel);
    }

    @Test
    void rulesIntegrateMomentsExactly() {
        // ∫ y^2j exp(−y²) dy = Γ(j + ½), exact for 2j < 2n (Gauss rules of order n)
        for (int i = 0; i < GaussHermite.ORDERS.length; i++) {
            final int n = GaussHermite.ORDERS[i];
            for (int j = 0; j < Math.min(n, 12); j++) {
                double sum = 0;
                for (int k = 0; k < GaussHermite.halfSize(i); k++) {
                    sum += 2 * GaussHermite.weight(i, k) * Math.pow(GaussHermite.node(i, k), 2 * j);
                }
                double gamma = Math.sqrt(Math.PI);
                for (int m = 0; m < j; m++) {
                    gamma *= m + 0.5;
                }
                assertEquals(gamma, sum, 1e-14 * gamma, "n = " + n + ", degree " + 2 * j);
            }
        }
    }
}
