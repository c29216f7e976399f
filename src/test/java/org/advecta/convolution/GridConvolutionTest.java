package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * The fast grid path against the direct per-point sum (route 2, itself checked against the
 * closed forms and mpmath): every point within the returned bound, for both methods, for
 * kernels much wider and much narrower than the spacing, and the bound itself not vacuous.
 */
class GridConvolutionTest {

    private static final long SEED = 20261202L;

    private static double[] data(Random rnd, int n, boolean signed) {
        final double[] v = new double[n];
        for (int j = 0; j < n; j++) {
            v[j] = (signed ? rnd.nextDouble() - 0.3 : rnd.nextDouble()) * Math.exp(-j * 3.0 / n);
        }
        return v;
    }

    private static void check(TransportParameters p, double t, int n, int nOut, double spacing,
                              double outShift, PiecewiseLinearProfile.Extension ext,
                              GridMethod method, Random rnd) {
        final double origin = -0.37 * n * spacing;
        final PiecewiseLinearProfile prof = PiecewiseLinearProfile.uniform(origin, spacing,
            data(rnd, n, true), ext);
        final ProfileConvolution pc = ProfileConvolution.of(p, prof);
        final double outOrigin = origin + outShift;
        final double[] grid = new double[nOut];
        final double bound = pc.valuesOnGrid(outOrigin, t, grid, method);
        final double[] x = new double[nOut];
        for (int i = 0; i < nOut; i++) {
            x[i] = Math.fma(i, spacing, outOrigin);
        }
        final double[] direct = new double[nOut];
        pc.values(x, t, direct);
        double worst = 0;
        for (int i = 0; i < nOut; i++) {
            // the direct sum is within 1e-15·max|f| of the exact value (its own tests)
            final double err = Math.abs(grid[i] - direct[i]);
            worst = Math.max(worst, err);
            assertTrue(err <= bound + 1e-15 * prof.maxAbs(),
                "i=" + i + " grid=" + grid[i] + " direct=" + direct[i] + " bound=" + bound + " " + p + " t=" + t + " n=" + n + " " + method + " " + ext + " shift=" + outShift);
        }
        // the bound is not vacuous: well below the data's scale
        assertTrue(bound < 1e-9 * prof.maxAbs(), "bound " + bound);
        assertTrue(worst <= bound + 1e-15 * prof.maxAbs());
    }

    @Test
    void windowAndFftAgreeWithTheDirectSum() {
        final Random rnd = new Random(SEED);
        final TransportParameters[] ps = {
            TransportParameters.of(1.0, 0.05),
            TransportParameters.of(-2.0, 0.5).withRetardation(3).withDecay(0.2),
            TransportParameters.of(0.3, 1e-9),
        };
        for (TransportParameters p : ps) {
            for (GridMethod m : GridMethod.values()) {
                for (PiecewiseLinearProfile.Extension ext : PiecewiseLinearProfile.Extension.values()) {
                    check(p, 0.7, 600, 500, 0.01, 0.123, ext, m, rnd);
                    check(p, 0.7, 300, 700, 0.02, -1.5, ext, m, rnd);
                    check(p, 0.02, 257, 257, 0.05, 0.0, ext, m, rnd);
                }
            }
        }
    }

    @Test
    void kernelFarNarrowerThanTheSpacingIsExact() {
        // D tiny: the window holds a few offsets, and the values are the interpolant
        final TransportParameters p = TransportParameters.of(0.25, 1e-30);
        final double[] v = {1, 4, 2, 8, 5};
        final PiecewiseLinearProfile prof = PiecewiseLinearProfile.uniform(0, 1, v,
            PiecewiseLinearProfile.Extension.ZERO);
        final double[] out = new double[9];
        for (GridMethod m : GridMethod.values()) {
            ProfileConvolution.of(p, prof).valuesOnGrid(-1.5, 2.0, out, m);
            // x_i = −1.5 + i, carried back by vt = 0.5: origins −2, −1, 0, 1, ..., 6
            final double[] expected = {0, 0, 1, 4, 2, 8, 5, 0, 0};
            expected[1] = 0.0;
            for (int i = 0; i < out.length; i++) {
                // node 0 and node 4 are ends of a zero-extended profile: half the value
                final double e = i == 2 ? 0.5 : i == 6 ? 2.5 : expected[i];
                assertEquals(e, out[i], 1e-14, "i=" + i + " " + m);
            }
        }
    }

    @Test
    void largeAndTinyDataDoNotOverflowOrUnderflowTheTransform() {
        final TransportParameters p = TransportParameters.of(0.0, 1.0);
        final Random rnd = new Random(SEED + 1);
        for (double scale : new double[] {1e300, 1e-300, Double.MIN_NORMAL}) {
            final double[] v = data(rnd, 400, false);
            for (int j = 0; j < v.length; j++) {
                v[j] *= scale;
            }
            v[17] = scale;
            final ProfileConvolution pc = ProfileConvolution.of(p,
                PiecewiseLinearProfile.uniform(0, 0.05, v, PiecewiseLinearProfile.Extension.ZERO));
            final double[] out = new double[400];
            final double bound = pc.valuesOnGrid(0, 0.5, out, GridMethod.FFT);
            for (int i = 0; i < out.length; i++) {
                final double direct = pc.value(Math.fma(i, 0.05, 0), 0.5);
                assertTrue(Double.isFinite(out[i]));
                assertTrue(Math.abs(out[i] - direct) <= bound + 1e-15 * scale, "i=" + i);
            }
        }
    }

    @Test
    void nonFiniteDataAreRejectedBeforeAnyTransform() {
        final double[] v = new double[64];
        v[10] = Double.NaN;
        assertThrows(IllegalArgumentException.class, () -> PiecewiseLinearProfile.uniform(0, 1, v,
            PiecewiseLinearProfile.Extension.ZERO));
        v[10] = Double.POSITIVE_INFINITY;
        assertThrows(IllegalArgumentException.class, () -> PiecewiseLinearProfile.uniform(0, 1, v,
            PiecewiseLinearProfile.Extension.ZERO));
        final ProfileConvolution nonUniform = ProfileConvolution.of(TransportParameters.of(1, 1),
            PiecewiseLinearProfile.of(new double[] {0, 1, 3}, new double[] {1, 2, 3},
                PiecewiseLinearProfile.Extension.ZERO));
        assertThrows(IllegalArgumentException.class,
            () -> nonUniform.valuesOnGrid(0, 1, new double[3], GridMethod.FFT));
        final ProfileConvolution ok = ProfileConvolution.of(TransportParameters.of(1, 1),
            PiecewiseLinearProfile.uniform(0, 1, new double[] {1, 2}, PiecewiseLinearProfile.Extension.ZERO));
        assertThrows(IllegalArgumentException.class,
            () -> ok.valuesOnGrid(Double.NaN, 1, new double[3], GridMethod.FFT));
        assertThrows(IllegalArgumentException.class,
            () -> ok.valuesOnGrid(0, -1, new double[3], GridMethod.FFT));
        assertThrows(IllegalArgumentException.class,
            () -> ok.valuesOnGrid(0, 1, new double[3], null));
    }
}
