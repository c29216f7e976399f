package org.advecta.plume;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.advecta.quadrature.Estimate;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * Bad input is rejected with an IllegalArgumentException naming the parameter and its value;
 * the documented special cases hold; the quadrature rule is exact where it must be.
 */
class PlumeInputTest {

    private static final TransportParameters P = TransportParameters.of(1.0, 0.5)
        .withDispersion(0.5, 0.05, 0.01).withRetardation(2).withDecay(0.01);

    private static void rejects(String fragment, Executable e) {
        final IllegalArgumentException ex = assertThrows(IllegalArgumentException.class, e);
        assertTrue(ex.getMessage().contains(fragment),
            "message should name " + fragment + ": " + ex.getMessage());
    }

    @Test
    void rejectsBadInput() {
        final PointSource3D point = PointSource3D.of(P, 0, 0, 0, 1);
        final LineSource2D line = LineSource2D.of(P, 0, 0, 1);
        final PatchSource3D patch = PatchSource3D.of(P, 0, -1, 1, -1, 1, 1);
        rejects("parameters", () -> PointSource3D.of(null, 0, 0, 0, 1));
        rejects("x0 = NaN", () -> PointSource3D.of(P, Double.NaN, 0, 0, 1));
        rejects("rate = Infinity", () -> LineSource2D.of(P, 0, 0, Double.POSITIVE_INFINITY));
        rejects("y2 = -1.0", () -> PatchSource3D.of(P, 0, 0, -1, 0, 1, 1));
        rejects("z2 = 0.0", () -> PatchSource3D.of(P, 0, 0, 1, 0, 0, 1));
        rejects("t = -1.0", () -> point.value(1, 0, 0, -1));
        rejects("t = NaN", () -> line.estimate(1, 0, Double.NaN));
        rejects("t = Infinity", () -> patch.estimate(1, 0, 0, Double.POSITIVE_INFINITY));
        rejects("x = NaN", () -> point.steadyValue(Double.NaN, 0, 0));
        rejects("y = Infinity", () -> line.steadyValue(1, Double.POSITIVE_INFINITY));
        rejects("source point", () -> point.value(0, 0, 0, 1));
        rejects("source line", () -> line.estimate(0, 0, 1));
        rejects("plane = 0.0", () -> point.massFlux(0, 1));
        rejects("plane = NaN", () -> patch.steadyMassFlux(Double.NaN));
        rejects("steady state", () -> LineSource2D.of(TransportParameters.of(0, 1), 0, 0, 1)
            .steadyValue(1, 1));
        rejects("times[1]", () -> RateHistory.of(new double[] {0, 0}, new double[] {1, 2}));
        rejects("times[0] = -1.0", () -> RateHistory.of(new double[] {-1}, new double[] {1}));
        rejects("rates", () -> RateHistory.of(new double[] {0, 1}, new double[] {1}));
        rejects("position = NaN", () -> Wall.reflecting(Wall.Axis.Y, Double.NaN));
        rejects("one side", () -> point.withWall(Wall.absorbing(Wall.Axis.Y, 0)));
        rejects("one side", () -> patch.withWall(Wall.reflecting(Wall.Axis.Z, 0)));
        rejects("no z axis", () -> line.withWall(Wall.reflecting(Wall.Axis.Z, 1)));
        final PointSource3D walled = point.withWall(Wall.absorbing(Wall.Axis.Y, -1));
        rejects("y = -2.0", () -> walled.value(1, -2, 0, 1));
        rejects("plane = 0.0", () -> walled.massFlux(0, 1));
        rejects("t = -1.0", () -> walled.massFluxEstimate(1, -1));
        rejects("plane = NaN", () -> walled.steadyMassFluxEstimate(Double.NaN));
        rejects("v = 0 and mu = 0", () -> PointSource3D.of(TransportParameters.of(0, 1), 0, 0, 0,
            1).withWall(Wall.absorbing(Wall.Axis.Y, -1)).steadyMassFlux(1));
        rejects("already set", () -> walled.withWall(Wall.reflecting(Wall.Axis.Y, 2)));
        rejects("out", () -> point.value(new double[2], new double[2], new double[2], 1,
            new double[1]));
        final double[] same = new double[1];
        rejects("different", () -> line.value(new double[] {1}, new double[] {1}, 1, same,
            same));
    }

    @Test
    void specialCases() {
        final PointSource3D point = PointSource3D.of(P, 0, 0, 0, 1);
        assertEquals(0.0, point.value(1, 0, 0, 0));
        assertEquals(0.0, point.massFlux(1, 0));
        final Estimate zero = LineSource2D.of(P, 0, 0, 1).estimate(1, 0, 0);
        assertEquals(0.0, zero.value());
        assertEquals(0.0, zero.error());
        assertEquals(0.0, zero.relativeError());
        assertEquals(0.0, PatchSource3D.of(P, 0, -1, 1, -1, 1, 1).value(0, 0, 0, 0));
        final RateHistory h = RateHistory.of(new double[] {1, 2}, new double[] {3, -1});
        assertEquals(0.0, h.rateAt(0.5));
        assertEquals(3.0, h.rateAt(1));
        assertEquals(-1.0, h.rateAt(7));
        assertEquals(-1.0, h.finalRate());
        // before the first start time nothing has been released
        assertEquals(0.0, point.withRateHistory(h).value(1, 0, 0, 1));
    }

    @Test
    void kronrodRuleIsExactToDegree22AndGaussToDegree13() {
        // QUADPACK's qk15 pair: K15 integrates x^k exactly for k ≤ 3·7 + 1 = 22, G7 for
        // k ≤ 13; ∫ x^k over [−1, 1] = 2/(k + 1) for even k
        for (int k = 0; k <= 22; k += 2) {
            assertEquals(2.0 / (k + 1), TimeQuadrature.monomial(k, false), 4e-16, "K15, k=" + k);
            if (k <= 13) {
                assertEquals(2.0 / (k + 1), TimeQuadrature.monomial(k, true), 4e-16,
                    "G7, k=" + k);
            }
        }
        assertTrue(Math.abs(TimeQuadrature.monomial(24, false) - 2.0 / 25) > 1e-12,
            "K15 is not exact beyond degree 23 (so the test above has teeth)");
        assertTrue(Math.abs(TimeQuadrature.monomial(14, true) - 2.0 / 15) > 1e-6,
            "G7 is not exact at degree 14");
    }
}
