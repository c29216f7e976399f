package org.advecta.verify;

import static org.advecta.verify.CellAveragesTest.assertMessage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InitialGaussian;
import org.advecta.solution.InitialStep;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * Observed orders, error norms and time-shifted solutions: exact identities.
 */
class ObservedOrderTest {

    @Property(tries = 200)
    void powerLawErrorsGiveTheirOrder(@ForAll @DoubleRange(min = 0.3, max = 6) double p,
                                      @ForAll @DoubleRange(min = 0.01, max = 100) double c,
                                      @ForAll @DoubleRange(min = 1.2, max = 4) double ratio) {
        final double[] h = {0.1, 0.1 / ratio, 0.1 / (ratio * ratio), 0.1 / (ratio * ratio * 1.5)};
        final double[] e = new double[h.length];
        for (int k = 0; k < h.length; k++) {
            e[k] = c * Math.pow(h[k], p);
        }
        final ObservedOrder o = ObservedOrder.of(h, e);
        for (double pk : o.pairwise()) {
            assertEquals(p, pk, 1e-12 * Math.max(1, p) * 100);
        }
        assertEquals(p, o.leastSquares(), 1e-10);
        assertEquals(c, o.constant(), 1e-8 * c);
        assertEquals(0, o.leastSquaresStandardError(), 1e-6);
        assertEquals(4, o.levels());
    }

    @Test
    void leastSquaresOfScatteredErrorsIsTheRegressionSlope() {
        // ln E = (0, 1, 3) at ln h = (0, 1, 2): slope 1.5, intercept −1/6, residuals (1/6,
        // −1/3, 1/6): s² = (1/6)/1, Sxx = 2, se = √(1/12)
        final double[] h = {1, Math.E, Math.E * Math.E};
        final double[] e = {1, Math.E, Math.exp(3)};
        final ObservedOrder o = ObservedOrder.of(h, e);
        assertEquals(1.5, o.leastSquares(), 1e-14);
        assertEquals(Math.sqrt(1.0 / 12), o.leastSquaresStandardError(), 1e-14);
        assertEquals(Math.exp(-1.0 / 6), o.constant(), 1e-14);
        assertEquals(1.0, o.pairwise()[0], 1e-14);
        assertEquals(2.0, o.pairwise()[1], 1e-14);
    }

    @Test
    void orderInputIsValidated() {
        assertMessage("spacings", () -> ObservedOrder.of(new double[] {1, 2},
            new double[] {1, 2}));
        assertMessage("errors[1] = 0.0", () -> ObservedOrder.of(new double[] {1, 2, 3},
            new double[] {1, 0, 2}));
        assertMessage("spacings[2] = 2.0", () -> ObservedOrder.of(new double[] {1, 2, 2},
            new double[] {1, 2, 3}));
        assertMessage("errors", () -> ObservedOrder.of(new double[] {1, 2, 3},
            new double[] {1, 2, 3, 4}));
    }

    @Test
    void normsFollowTheirDefinitions() {
        final double[] computed = {1, 2, 4};
        final double[] exact = {1.5, 2, 2};
        final double[] w = {0.5, 1, 2};
        final ErrorNorms n = ErrorNorms.of(computed, exact, w);
        assertEquals(0.5 * 0.5 + 2 * 2, n.l1(), 1e-15);
        assertEquals(Math.sqrt(0.5 * 0.25 + 2 * 4), n.l2(), 1e-15);
        assertEquals(2, n.lInf(), 0);
        assertEquals(4.25 / (0.75 + 2 + 4), n.relativeL1(), 1e-15);
        assertEquals(Math.sqrt(8.125) / Math.sqrt(0.5 * 2.25 + 4 + 8), n.relativeL2(), 1e-15);
        assertEquals(1.0, n.relativeLInf(), 0);
        final ErrorNorms mean = ErrorNorms.of(computed, exact, null);
        assertEquals(2.5 / 3, mean.l1(), 1e-15);
        assertEquals(Math.sqrt(4.25 / 3), mean.l2(), 1e-15);
        assertEquals(3, mean.count());
        assertThrows(IllegalStateException.class,
            () -> ErrorNorms.of(computed, new double[3], null).relativeL2());
    }

    @Test
    void normsOnCellsAndPointsUseTheExactSolution() {
        final Solution1D s = InitialGaussian.of(TransportParameters.of(0.5, 0.01), 0.2, 0.1, 1);
        final double[] faces = {0, 0.25, 0.5, 0.75, 1};
        final double[] averages = new double[4];
        CellAverages.averages(s, faces, 0.5, averages);
        assertEquals(0, ErrorNorms.onCells(s, faces, 0.5, averages).l1(), 0);
        // point values at centres differ from cell averages by (h²/24)·∂²c/∂x² + O(h⁴):
        // on 40 cells the L1 difference is that to 1 %
        final double[] fine = new double[41];
        for (int i = 0; i <= 40; i++) {
            fine[i] = i / 40.0;
        }
        final double[] fineAverages = new double[40];
        CellAverages.averages(s, fine, 0.5, fineAverages);
        final ErrorNorms mixed = ErrorNorms.atCellCentres(s, fine, 0.5, fineAverages);
        final double variance = 0.01 + 2 * 0.01 * 0.5;
        double predicted = 0;
        for (int i = 0; i < 40; i++) {
            final double xi = (i + 0.5) / 40 - 0.2 - 0.5 * 0.5;
            final double c2 = s.value((i + 0.5) / 40, 0.5)
                * (xi * xi / (variance * variance) - 1 / variance);
            predicted += Math.abs(c2) / (40 * 40 * 24) / 40;
        }
        assertEquals(predicted, mixed.l1(), 0.01 * predicted);
        final double[] x = {0.1, 0.4};
        final double[] t = {0.5, 1.0};
        final double[] values = {s.value(0.1, 0.5), s.value(0.4, 1.0) + 1e-3};
        final ErrorNorms pts = ErrorNorms.atPoints(s, x, t, values, null);
        assertEquals(1e-3, pts.lInf(), 1e-15);
        assertEquals(0.5e-3, pts.l1(), 1e-15);
        assertMessage("computed: needs 4", () -> ErrorNorms.onCells(s, faces, 0.5,
            new double[3]));
        assertMessage("computed[1] = NaN", () -> ErrorNorms.of(new double[] {1, Double.NaN},
            new double[] {1, 1}, null));
        assertMessage("weights[0] = 0.0", () -> ErrorNorms.of(new double[] {1},
            new double[] {1}, new double[] {0}));
        assertMessage("x, t and computed", () -> ErrorNorms.atPoints(s, x,
            new double[] {1, 2, 3}, values, null));
    }

    @Property(tries = 100)
    void timeShiftedSolutionIsTheOriginalLater(
            @ForAll @DoubleRange(min = 0, max = 5) double x,
            @ForAll @DoubleRange(min = 0, max = 3) double t,
            @ForAll @DoubleRange(min = 0.01, max = 2) double t0) {
        final TransportParameters p = TransportParameters.of(0.7, 0.05).withRetardation(1.4)
            .withDecay(0.1);
        for (Solution1D s : new Solution1D[] {
            InitialStep.of(p, 1, 2, InitialStep.Side.LEFT),
            FirstTypeInlet.of(p, InletInput.pulse(1, 0.5))}) {
            final TimeShiftedSolution later = TimeShiftedSolution.of(s, t0);
            assertEquals(s.value(x, t + t0), later.value(x, t), 0);
            assertEquals(s.gradient(x, t + t0), later.gradient(x, t), 0);
            assertEquals(s.flux(x, t + t0), later.flux(x, t), 0);
            assertEquals(s.fluxAveraged(x, t + t0), later.fluxAveraged(x, t), 0);
            assertEquals(p, later.parameters());
            assertEquals(s.domain(), later.domain());
        }
    }
}
