package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.advecta.solution.InitialGaussian;
import org.advecta.solution.InitialSlug;
import org.advecta.solution.InitialStep;
import org.advecta.solution.Solution1D;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * Route 2 (samples) against the library's closed forms (Crank 1975 eqs. 2.14, 2.15 and §2.2,
 * independently implemented in org.advecta.solution and checked there against mpmath): a
 * box and a step are piecewise linear, so their samples must reproduce the closed forms to
 * rounding; a sampled Gaussian differs from its closed form by the interpolation error,
 * whose leading term (Δ²/12)·∂²c/∂x² is checked.
 */
class ClosedFormAgreementTest {

    private static final TransportParameters[] PARAMS = {
        TransportParameters.of(1.0, 0.1),
        TransportParameters.of(-3.0, 2.0).withRetardation(2.5).withDecay(0.3),
        TransportParameters.of(0.0, 1e-3).withDecay(1.0),
        TransportParameters.of(50.0, 1e-6).withRetardation(1.5),
    };
    private static final double[] TIMES = {1e-4, 0.01, 0.3, 1.0, 7.0};

    /** Relative error allowed against the closed forms (the target). */
    private static final double RELATIVE = 1e-12;

    /**
     * 1e-12 relative, or where the inputs' own rounding moves the value by more (far tails of
     * a narrow kernel: κ ≈ (2|y| + 2)·(|x| + |vt/R| + |ξ|)/L + 2y² at the nearest edge ξ, y its
     * scaled distance), 8κ units of 2⁻⁵³ relative: both implementations are held to that.
     */
    private static void compare(Solution1D expected, Solution1D actual, double x, double t,
                                double scale, double... edges) {
        final double e = expected.value(x, t);
        final double a = actual.value(x, t);
        final TransportParameters p = expected.parameters();
        final double drift = p.velocity() * t / p.retardation();
        final double len = Math.sqrt(4 * p.dispersion() * t / p.retardation());
        double kappa = 0;
        for (double edge : edges) {
            final double y = Math.abs(x - drift - edge) / len;
            kappa = Math.max(kappa, (2 * y + 2) * (Math.abs(x) + Math.abs(drift) + Math.abs(edge)) / len
                + 2 * y * y);
        }
        final double rel = Math.max(RELATIVE, 8 * kappa * 0x1.0p-53);
        assertEquals(e, a, rel * Math.abs(e) + 1e-300 * scale,
            () -> "x=" + x + " t=" + t + " " + expected.parameters());
        // the gradient: Σ jumps·G at the edges, judged against the size of those terms
        // (it passes through 0 at a box's centre)
        double size = 0;
        for (double edge : edges) {
            final double y = (x - drift - edge) / len;
            size += scale / (len * Math.sqrt(Math.PI)) * Math.exp(-y * y);
        }
        final double ge = expected.gradient(x, t);
        final double ga = actual.gradient(x, t);
        assertEquals(ge, ga, rel * size + 1e-300 * scale / len,
            () -> "gradient x=" + x + " t=" + t + " " + expected.parameters());
    }

    @Test
    void boxSamplesReproduceTheSlug() {
        for (TransportParameters p : PARAMS) {
            final PiecewiseLinearProfile box = PiecewiseLinearProfile.of(
                new double[] {-0.5, 1.25}, new double[] {2.0, 2.0},
                PiecewiseLinearProfile.Extension.ZERO);
            final PiecewiseLinearProfile cells = PiecewiseLinearProfile.cellAverages(
                new double[] {-0.5, 0.25, 1.25}, new double[] {2.0, 2.0});
            final Solution1D slug = InitialSlug.of(p, -0.5, 1.25, 2.0);
            for (double t : TIMES) {
                final double drift = p.velocity() * t / p.retardation();
                final double len = Math.sqrt(4 * p.dispersion() * t / p.retardation());
                for (int i = -60; i <= 60; i++) {
                    final double x = drift + 0.375 + i * (0.1 + len / 4);
                    compare(slug, ProfileConvolution.of(p, box), x, t, 2, -0.5, 1.25);
                    compare(slug, ProfileConvolution.of(p, cells), x, t, 2, -0.5, 1.25);
                }
            }
        }
    }

    @Test
    void stepSamplesReproduceTheStep() {
        for (TransportParameters p : PARAMS) {
            final PiecewiseLinearProfile left = PiecewiseLinearProfile.of(
                new double[] {0.75, 0.75, 2.0}, new double[] {3.0, 0.0, 0.0},
                PiecewiseLinearProfile.Extension.CONSTANT);
            final PiecewiseLinearProfile right = PiecewiseLinearProfile.of(
                new double[] {-4.0, 0.75, 0.75}, new double[] {0.0, 0.0, 3.0},
                PiecewiseLinearProfile.Extension.CONSTANT);
            final Solution1D l = InitialStep.of(p, 0.75, 3.0, InitialStep.Side.LEFT);
            final Solution1D r = InitialStep.of(p, 0.75, 3.0, InitialStep.Side.RIGHT);
            for (double t : TIMES) {
                final double drift = p.velocity() * t / p.retardation();
                final double len = Math.sqrt(4 * p.dispersion() * t / p.retardation());
                for (int i = -60; i <= 60; i++) {
                    final double x = drift + 0.75 + i * (len / 5);
                    compare(l, ProfileConvolution.of(p, left), x, t, 3, 0.75);
                    compare(r, ProfileConvolution.of(p, right), x, t, 3, 0.75);
                }
            }
        }
    }

    @Test
    void sampledGaussianDiffersByTheInterpolationError() {
        // φ_PL − φ averages −(Δ²/12)φ'' over each cell, so c_PL − c = (Δ²/12)·c_xx + O(Δ⁴)
        // (the Euler–Maclaurin leading term of linear interpolation; common practice)
        final TransportParameters p = TransportParameters.of(0.5, 0.2).withDecay(0.1);
        final double s0 = 1.0;
        final double step = 1.0 / 64;
        final int n = (int) (24 / step) + 1;
        final double[] v = new double[n];
        for (int j = 0; j < n; j++) {
            final double xi = -12 + j * step;
            v[j] = Math.exp(-xi * xi / (2 * s0 * s0)) / (s0 * Math.sqrt(2 * Math.PI));
        }
        final ProfileConvolution pc = ProfileConvolution.of(p,
            PiecewiseLinearProfile.uniform(-12, step, v, PiecewiseLinearProfile.Extension.ZERO));
        final InitialGaussian g = InitialGaussian.of(p, 0.0, s0, 1.0);
        final double t = 0.5;
        final double var = s0 * s0 + 2 * p.dispersion() * t;
        double worst = 0;
        for (int i = -40; i <= 40; i++) {
            final double x = 0.25 + i * 0.1;
            final double exact = g.value(x, t);
            final double xi = x - p.velocity() * t;
            final double cxx = exact * (xi * xi / (var * var) - 1 / var);
            final double diff = pc.value(x, t) - exact - step * step / 12 * cxx;
            worst = Math.max(worst, Math.abs(diff));
        }
        // O(Δ⁴) remainder: Δ⁴/240·max|c''''| with max|c''''| ≤ 3/(√(2π) var^{5/2}) (≈1.2 here)
        assertTrue(worst < Math.pow(step, 4) / 240 * 3 / Math.sqrt(2 * Math.PI)
            / Math.pow(var, 2.5) * 2, "remainder " + worst);
    }
}
