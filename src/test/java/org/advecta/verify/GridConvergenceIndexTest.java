package org.advecta.verify;

import static org.advecta.verify.CellAveragesTest.assertMessage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The published worked example of the GCI procedure, and exact identities of it.
 */
class GridConvergenceIndexTest {

    /**
     * Celik, Ghia, Roache, Freitas, Coleman &amp; Raad (2008), J. Fluids Eng. 130(7), 078001,
     * Table 1, first column (a two-dimensional flow, dimensionless reattachment length):
     * N₁, N₂, N₃ = 18 000, 8 000, 4 500 cells, φ₁, φ₂, φ₃ = 6.063, 5.972, 5.863; published
     * r₂₁ = 1.5, r₃₂ = 1.333, p = 1.53, φ_ext = 6.1685, e_a = 1.5 %, e_ext = 1.7 %,
     * GCI_fine = 2.2 %. The table was recalled from memory (the φ values also appear in a
     * public course script that reproduces the procedure); every published digit is checked
     * to the precision printed.
     */
    @Test
    void celikEtAl2008TableOne() {
        final double h1 = Math.sqrt(1.0 / 18000);
        final double h2 = Math.sqrt(1.0 / 8000);
        final double h3 = Math.sqrt(1.0 / 4500);
        final GridConvergenceIndex g = GridConvergenceIndex.of(h1, h2, h3, 6.063, 5.972, 5.863);
        assertEquals(1.5, g.fineRatio(), 1e-12);
        assertEquals(1.333, g.coarseRatio(), 0.0005);
        assertEquals(1.53, g.order(), 0.005);
        assertEquals(6.1685, g.extrapolated(), 0.00005);
        assertEquals(0.015, g.approximateRelativeError(), 0.0005);
        assertEquals(0.017, g.extrapolatedRelativeError(), 0.0005);
        assertEquals(0.022, g.fineGridIndex(), 0.0005);
        assertEquals(1.25, g.safetyFactor(), 0.0);
        assertFalse(g.isOscillatory());
    }

    @Test
    void exactDataOfKnownOrderGiveThatOrderAndTheLimit() {
        // φ(h) = 3 + 0.7·h^p exactly: the procedure returns p and φ(0) = 3 (to rounding),
        // with unequal ratios (the fixed point) and equal ones (one step)
        for (double p : new double[] {1.0, 1.7, 2.0, 3.0}) {
            final double[] h = {0.01, 0.017, 0.031};
            final GridConvergenceIndex g = GridConvergenceIndex.of(h[0], h[1], h[2],
                3 + 0.7 * Math.pow(h[0], p), 3 + 0.7 * Math.pow(h[1], p),
                3 + 0.7 * Math.pow(h[2], p), 3.0);
            assertEquals(p, g.order(), 1e-8 * p);
            assertEquals(3.0, g.extrapolated(), 1e-12);
            final double ea = Math.abs(0.7 * (Math.pow(h[1], p) - Math.pow(h[0], p))
                / (3 + 0.7 * Math.pow(h[0], p)));
            assertEquals(3.0 * ea / (Math.pow(h[1] / h[0], p) - 1), g.fineGridIndex(),
                1e-9 * g.fineGridIndex());
        }
    }

    @Test
    void oscillatoryConvergenceIsReported() {
        // φ(h) = 1 + (−1)^k·h²-like signs: differences of opposite sign
        final GridConvergenceIndex g = GridConvergenceIndex.of(1, 2, 4, 1.01, 0.96, 1.16);
        assertTrue(g.isOscillatory());
        assertTrue(g.order() > 0);
    }

    @Test
    void invalidInputIsRejectedNamingTheArgument() {
        assertMessage("h2 = 1.0", () -> GridConvergenceIndex.of(1, 1, 2, 1, 2, 3));
        assertMessage("h3 = 1.5", () -> GridConvergenceIndex.of(1, 2, 1.5, 1, 2, 3));
        assertMessage("phi2 = 1.0", () -> GridConvergenceIndex.of(1, 2, 3, 1, 1, 3));
        assertMessage("phi3 = 2.0", () -> GridConvergenceIndex.of(1, 2, 3, 1, 2, 2));
        assertMessage("phi1 = 0.0", () -> GridConvergenceIndex.of(1, 2, 3, 0, 2, 3));
        assertMessage("phi1 = NaN", () -> GridConvergenceIndex.of(1, 2, 3, Double.NaN, 2, 3));
        assertMessage("safetyFactor = 0.5",
            () -> GridConvergenceIndex.of(1, 2, 3, 1, 2, 3, 0.5));
        assertMessage("h1 = -1.0", () -> GridConvergenceIndex.of(-1, 2, 3, 1, 2, 3));
    }
}
