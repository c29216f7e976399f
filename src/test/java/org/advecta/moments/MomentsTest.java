package org.advecta.moments;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleUnaryOperator;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InitialGaussian;
import org.advecta.solution.InitialSlug;
import org.advecta.solution.InitialStep;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.testing.Integrals;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * Every analytic moment formula against numerical integration (trapezoid rule, whose error for
 * these smooth curves that vanish with all derivatives at both ends is far below the
 * tolerances: see {@link Integrals}) of the library's own solution; moments of data against
 * exact integrals of piecewise-linear curves.
 */
class MomentsTest {

    /** Relative tolerance of the comparison with quadrature (measured worst 2e-14). */
    private static final double TOLERANCE = 1e-12;

    private static final TransportParameters P = TransportParameters.of(0.6, 0.04)
        .withRetardation(1.7).withDecay(0.05);
    private static final TransportParameters P0 = TransportParameters.of(0.6, 0.04)
        .withRetardation(1.7);

    /** m₀, mean, variance of f over [a, b] by the trapezoid rule. */
    private static double[] numerical(DoubleUnaryOperator f, double a, double b) {
        final int n = 40000;
        final double m0 = Integrals.trapezoid(f, a, b, n);
        final double mean = Integrals.trapezoid(s -> s * f.applyAsDouble(s), a, b, n) / m0;
        final double var = Integrals.trapezoid(s -> (s - mean) * (s - mean) * f.applyAsDouble(s),
            a, b, n) / m0;
        return new double[] {m0, mean, var};
    }

    private static double worst;

    private static void check(Moments m, double[] q, String what) {
        final double e0 = Math.abs(m.mass() - q[0]) / q[0];
        final double e1 = Math.abs(m.mean() - q[1]) / q[1];
        final double e2 = Math.abs(m.variance() - q[2]) / q[2];
        worst = Math.max(worst, Math.max(e0, Math.max(e1, e2)));
        System.out.printf("moments %s: analytic %s, quadrature [%s, %s, %s]%n", what, m, q[0],
            q[1], q[2]);
        assertTrue(e0 <= TOLERANCE && e1 <= TOLERANCE && e2 <= TOLERANCE,
            () -> what + ": " + m + " vs " + q[0] + ", " + q[1] + ", " + q[2]);
    }

    private static double[] breakthrough(Solution1D s, double x, boolean flux, double tMax) {
        return numerical(t -> flux ? s.fluxAveraged(x, t) : s.value(x, t), 0, tMax);
    }

    @Test
    void firstTypeInletPulseResident() {
        for (TransportParameters p : new TransportParameters[] {P, P0}) {
            final Solution1D s = FirstTypeInlet.of(p, InletInput.pulse(2.0, 0.8));
            check(Moments.breakthrough(s, 1.5, false), breakthrough(s, 1.5, false, 40),
                "first-type pulse, mu=" + p.decayRate());
        }
    }

    @Test
    void thirdTypeInletPulseResidentAndFluxAveraged() {
        for (TransportParameters p : new TransportParameters[] {P, P0}) {
            final Solution1D s = ThirdTypeInlet.of(p, InletInput.pulse(2.0, 0.8));
            check(Moments.breakthrough(s, 0.7, false), breakthrough(s, 0.7, false, 30),
                "third-type pulse resident, mu=" + p.decayRate());
            check(Moments.breakthrough(s, 0.7, true), breakthrough(s, 0.7, true, 30),
                "third-type pulse flux-averaged, mu=" + p.decayRate());
        }
    }

    @Test
    void exponentialInputs() {
        final Solution1D first = FirstTypeInlet.of(P, InletInput.exponential(1.5, 0.9));
        check(Moments.breakthrough(first, 1.2, false), breakthrough(first, 1.2, false, 80),
            "first-type exponential");
        final Solution1D third = ThirdTypeInlet.of(P, InletInput.exponential(1.5, 0.9));
        check(Moments.breakthrough(third, 1.2, false), breakthrough(third, 1.2, false, 80),
            "third-type exponential");
    }

    @Test
    void classicalRelationsWithoutDecay() {
        // μ = 0 and a short pulse: mean → Rx/v + t₀/2, variance → 2DR²x/v³ + t₀²/12
        final Moments m = Moments.breakthrough(FirstTypeInlet.of(P0, InletInput.pulse(1, 0.1)),
            2.0, false);
        assertEquals(1.7 * 2 / 0.6 + 0.05, m.mean(), 1e-14);
        assertEquals(2 * 0.04 * 1.7 * 1.7 * 2 / (0.6 * 0.6 * 0.6) + 0.01 / 12, m.variance(),
            1e-14);
        assertEquals(0.1, m.mass(), 1e-16);
        final Moments r = Moments.breakthrough(ThirdTypeInlet.of(P0, InletInput.pulse(1, 0.1)),
            2.0, false);
        assertEquals(1.7 * (2 / 0.6 + 0.04 / 0.36) + 0.05, r.mean(), 1e-13);
        assertEquals(2 * 0.04 * 1.7 * 1.7 * 2 / 0.216 + 3 * 0.0016 * 1.7 * 1.7 / 0.1296
            + 0.01 / 12, r.variance(), 1e-13);
    }

    @Test
    void spatialMomentsOfPlumes() {
        final Solution1D g = InitialGaussian.of(P, 0.3, 0.2, 1.4);
        check(Moments.profile(g, 2.0), numerical(x -> g.value(x, 2.0), -5, 8), "gaussian");
        final Solution1D s = InitialSlug.of(P, -0.2, 0.5, 3.0);
        check(Moments.profile(s, 1.5), numerical(x -> s.value(x, 1.5), -5, 8), "slug");
    }

    @Test
    void momentsOfDataAreThoseOfThePiecewiseLinearCurve() {
        // a tent of height 1 on [1, 3]: mass 1, mean 2, variance 1/6 (half-width² / 6)
        final Moments m = Moments.ofSamples(new double[] {0, 1, 2, 3, 4},
            new double[] {0, 0, 1, 0, 0});
        assertEquals(1, m.mass(), 1e-15);
        assertEquals(2, m.mean(), 1e-15);
        assertEquals(1.0 / 6, m.variance(), 1e-15);
        // a right-angled triangle c = s on [0, 1]: mass 1/2, mean 2/3, variance 1/18
        final Moments t = Moments.ofSamples(new double[] {0, 0.5, 1}, new double[] {0, 0.5, 1});
        assertEquals(0.5, t.mass(), 1e-15);
        assertEquals(2.0 / 3, t.mean(), 1e-15);
        assertEquals(1.0 / 18, t.variance(), 1e-15);
        // samples of a library curve converge to its analytic moments
        final Solution1D s = ThirdTypeInlet.of(P, InletInput.pulse(2.0, 0.8));
        final double[] times = new double[4001];
        final double[] c = new double[times.length];
        for (int i = 0; i < times.length; i++) {
            times[i] = i * 0.01;
            c[i] = s.fluxAveraged(1.0, times[i]);
        }
        final Moments data = Moments.ofSamples(times, c);
        final Moments exact = Moments.breakthrough(s, 1.0, true);
        assertEquals(exact.mean(), data.mean(), 1e-4 * exact.mean());
        assertEquals(exact.variance(), data.variance(), 1e-3 * exact.variance());
    }

    @Test
    void badInputIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> Moments.ofSamples(
            new double[] {0, 1, 2}, new double[] {0, 0, 0}));
        assertThrows(IllegalArgumentException.class, () -> Moments.ofSamples(
            new double[] {0, 1, 1}, new double[] {0, 1, 0}));
        assertThrows(IllegalArgumentException.class, () -> Moments.ofSamples(
            new double[] {0, 1, 2}, new double[] {0, Double.NaN, 0}));
        assertThrows(IllegalArgumentException.class, () -> Moments.breakthrough(
            FirstTypeInlet.of(P, InletInput.constant(1)), 1, false));
        assertThrows(IllegalArgumentException.class, () -> Moments.breakthrough(
            FirstTypeInlet.of(P, InletInput.pulse(1, 1)), 1, true));
        assertThrows(IllegalArgumentException.class, () -> Moments.breakthrough(
            FirstTypeInlet.of(P, InletInput.pulse(1, 1)).withInitialConcentration(1), 1,
            false));
        assertThrows(IllegalArgumentException.class, () -> Moments.breakthrough(
            FirstTypeInlet.of(P, InletInput.pulse(1, 1)), 0, false));
        assertThrows(IllegalArgumentException.class, () -> Moments.profile(
            InitialStep.of(P, 0, 1, InitialStep.Side.LEFT), 1));
    }
}
