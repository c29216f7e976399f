package org.advecta.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.advecta.solution.InitialStep;
import org.advecta.solution.Solution1D;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * The worked client: a small finite-volume solver ({@link FiniteVolumeClient}) refined on
 * five grids against an exact solution, whose observed orders the library reports as 1
 * (upwind) and 2 (central, Crank–Nicolson) within ±0.1 — the check the issue asks for.
 *
 * <p>The exact solution is a step (discontinuous at t = 0) started at t₀ = 0.2 through
 * {@link TimeShiftedSolution}, so the solver starts from smooth data: the exact cell averages
 * of c(x, t₀).
 */
class FiniteVolumeOrderTest {

    private static final TransportParameters P = TransportParameters.of(1.0, 0.01)
        .withRetardation(1.2).withDecay(0.5);
    private static final Solution1D EXACT = TimeShiftedSolution.of(
        InitialStep.of(P, 0.25, 1.0, InitialStep.Side.LEFT), 0.2);
    private static final int[] CELLS = {50, 100, 200, 400, 800};
    private static final double T_END = 0.3;

    private static ObservedOrder study(FiniteVolumeClient.Scheme scheme, boolean l2) {
        final double[] h = new double[CELLS.length];
        final double[] e = new double[CELLS.length];
        for (int k = 0; k < CELLS.length; k++) {
            final int n = CELLS[k];
            final double[] u = FiniteVolumeClient.solve(EXACT, scheme, 0, 1, n, T_END);
            final double[] faces = new double[n + 1];
            for (int i = 0; i <= n; i++) {
                faces[i] = (double) i / n;
            }
            final ErrorNorms norms = ErrorNorms.onCells(EXACT, faces, T_END, u);
            h[k] = 1.0 / n;
            e[k] = l2 ? norms.l2() : norms.l1();
        }
        return ObservedOrder.of(h, e);
    }

    private static void assertOrder(ObservedOrder o, double expected) {
        System.out.println("finite-volume client, expected order " + expected + ": " + o);
        assertEquals(expected, o.leastSquares(), 0.1, o::toString);
        final double[] pairwise = o.pairwise();
        // every refinement pair, not only the fit, lies within ±0.1
        for (double p : pairwise) {
            assertEquals(expected, p, 0.1, o::toString);
        }
    }

    @Test
    void upwindIsFirstOrder() {
        assertOrder(study(FiniteVolumeClient.Scheme.UPWIND_EXPLICIT, false), 1.0);
    }

    @Test
    void crankNicolsonIsSecondOrder() {
        assertOrder(study(FiniteVolumeClient.Scheme.CENTRAL_CRANK_NICOLSON, false), 2.0);
        assertOrder(study(FiniteVolumeClient.Scheme.CENTRAL_CRANK_NICOLSON, true), 2.0);
    }

    @Test
    void gridConvergenceIndexBracketsTheExactCellMass() {
        // φ = the mass in [0, 1] at T_END, on the three finest grids; the GCI (no exact
        // solution used) must bracket the exact value, and the apparent order is ≈ 2.
        final double[] phi = new double[3];
        final double[] h = new double[3];
        for (int k = 0; k < 3; k++) {
            final int n = CELLS[CELLS.length - 1 - k];
            final double[] u = FiniteVolumeClient.solve(EXACT,
                FiniteVolumeClient.Scheme.CENTRAL_CRANK_NICOLSON, 0, 1, n, T_END);
            double sum = 0;
            for (double x : u) {
                sum += x / n;
            }
            phi[k] = sum;
            h[k] = 1.0 / n;
        }
        final GridConvergenceIndex gci = GridConvergenceIndex.of(h[0], h[1], h[2], phi[0],
            phi[1], phi[2]);
        final double exact = CellAverages.average(EXACT, 0, 1, T_END);
        System.out.println("finite-volume client, mass: " + gci + ", exact " + exact);
        assertEquals(2.0, gci.order(), 0.1);
        assertTrue(Math.abs(phi[0] - exact) <= gci.fineGridIndex() * Math.abs(phi[0]),
            () -> "|phi1 - exact| = " + Math.abs(phi[0] - exact) + " > GCI·|phi1|");
        assertTrue(Math.abs(gci.extrapolated() - exact) < Math.abs(phi[0] - exact),
            "Richardson extrapolation is closer to the exact value than the finest grid");
    }
}
