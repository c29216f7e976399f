package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.advecta.kernel.FreeSpaceKernel1D;
import org.advecta.quadrature.Estimate;
import org.advecta.testing.Integrals;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * Point releases with a time-varying rate: the train is the superposed kernel; the
 * continuous release conserves the released mass (∫c dx = ∫₀ᵗ q(s)·e^{−μ(t−s)/R} ds, an
 * exact identity of the kernel, whose x-integral is e^{−μτ/R}).
 */
class PointReleaseTest {

    private static final TransportParameters P = TransportParameters.of(0.8, 0.3)
        .withRetardation(1.5).withDecay(0.2);

    @Test
    void trainIsTheSumOfKernels() {
        final PointRelease r = PointRelease.train(P, 0.5, new double[] {0, 0.7, 1.3},
            new double[] {2, -1, 0.5});
        final FreeSpaceKernel1D k = FreeSpaceKernel1D.of(P, 0.5);
        for (double x : new double[] {-1, 0.5, 1.2, 3}) {
            final double t = 2.0;
            final double e = 2 * k.value(x, t) - k.value(x, t - 0.7) + 0.5 * k.value(x, t - 1.3);
            assertEquals(e, r.value(x, t).value(), 1e-15 * (2 * k.value(x, t) + k.value(x, t - 0.7)
                + 0.5 * k.value(x, t - 1.3)));
            // before the second release only the first counts
            assertEquals(2 * k.value(x, 0.5), r.value(x, 0.5).value(), 4 * Math.ulp(k.value(x, 0.5)));
        }
    }

    @Test
    void continuousReleaseConservesMass() {
        final double t = 2.5;
        final PointRelease r = PointRelease.continuous(P, 0.25, s -> 1 + Math.sin(3 * s))
            .withQuadrature(1e-300, 1e-13);
        final double lam = P.decayRate() / P.retardation();
        // ∫₀ᵗ (1 + sin 3s)·e^{−λ(t−s)} ds in closed form
        final double a = (1 - Math.exp(-lam * t)) / lam;
        final double b = (lam * Math.sin(3 * t) - 3 * Math.cos(3 * t) + 3 * Math.exp(-lam * t))
            / (lam * lam + 9);
        final double mass = a + b;
        final double len = Math.sqrt(4 * P.dispersion() * t / P.retardation());
        final double lo = 0.25 - 16 * len;
        final double hi = 0.25 + P.velocity() * t / P.retardation() + 16 * len;
        // trapezoid in x; the profile has a kink-free cusp only at x₀ (the 1/√τ end),
        // so resolve finely: the check is at 1e-6 relative
        final double integral = Integrals.trapezoid(x -> r.value(x, t).value(), lo, hi, 20000);
        assertEquals(mass, integral, 1e-6 * mass);
    }

    @Test
    void continuousEstimateCoversAFineReference() {
        final PointRelease coarse = PointRelease.continuous(P, 0.0, s -> Math.exp(-s))
            .withQuadrature(1e-300, 1e-6);
        final PointRelease fine = PointRelease.continuous(P, 0.0, s -> Math.exp(-s))
            .withQuadrature(1e-300, 1e-14);
        for (double x : new double[] {-0.5, 0.3, 1.0, 2.0}) {
            final Estimate c = coarse.value(x, 1.7);
            final Estimate f = fine.value(x, 1.7);
            assertTrue(Math.abs(c.value() - f.value()) <= c.error() + f.error(),
                x + ": " + c + " vs " + f);
        }
    }

    @Test
    void badInputIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> PointRelease.train(P, 0,
            new double[] {1, 1}, new double[] {1, 1}));
        assertThrows(IllegalArgumentException.class, () -> PointRelease.train(P, 0,
            new double[] {-1}, new double[] {1}));
        assertThrows(IllegalArgumentException.class, () -> PointRelease.train(P, Double.NaN,
            new double[] {1}, new double[] {1}));
        assertThrows(IllegalArgumentException.class, () -> PointRelease.continuous(P, 0,
            s -> Double.NaN).value(1, 1));
        assertThrows(IllegalArgumentException.class, () -> PointRelease.continuous(P, 0, s -> 1)
            .value(1, -1));
    }
}
