package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/** Validation of the data and the t = 0 semantics stated in the javadoc. */
class ProfileInputTest {

    private static final PiecewiseLinearProfile.Extension ZERO = PiecewiseLinearProfile.Extension.ZERO;

    private static void rejects(String name, Runnable r) {
        final IllegalArgumentException e = assertThrows(IllegalArgumentException.class, r::run);
        assertTrue(e.getMessage().contains(name), e.getMessage());
    }

    @Test
    void badDataAreRejectedNamingTheParameter() {
        rejects("nodes[1]", () -> PiecewiseLinearProfile.of(new double[] {0, Double.NaN},
            new double[] {1, 1}, ZERO));
        rejects("values[1]", () -> PiecewiseLinearProfile.of(new double[] {0, 1},
            new double[] {1, Double.POSITIVE_INFINITY}, ZERO));
        rejects("nodes[2]", () -> PiecewiseLinearProfile.of(new double[] {0, 2, 1},
            new double[] {1, 1, 1}, ZERO));
        rejects("nodes[3]", () -> PiecewiseLinearProfile.of(new double[] {0, 1, 1, 1},
            new double[] {1, 1, 1, 1}, ZERO));
        rejects("nodes[1]", () -> PiecewiseLinearProfile.of(new double[] {1, 1},
            new double[] {1, 2}, ZERO));
        rejects("values", () -> PiecewiseLinearProfile.of(new double[] {0, 1, 2},
            new double[] {1, 1, 1, 1}, ZERO));
        rejects("nodes", () -> PiecewiseLinearProfile.of(null, new double[] {1}, ZERO));
        rejects("extension", () -> PiecewiseLinearProfile.of(new double[] {0, 1},
            new double[] {1, 1}, null));
        rejects("spacing", () -> PiecewiseLinearProfile.uniform(0, 0, new double[] {1, 1}, ZERO));
        rejects("spacing", () -> PiecewiseLinearProfile.uniform(0, Double.NaN,
            new double[] {1, 1}, ZERO));
        rejects("origin", () -> PiecewiseLinearProfile.uniform(Double.NEGATIVE_INFINITY, 1,
            new double[] {1, 1}, ZERO));
        rejects("edges[1]", () -> PiecewiseLinearProfile.cellAverages(new double[] {0, 0, 1},
            new double[] {1, 1}));
        rejects("edges", () -> PiecewiseLinearProfile.cellAverages(new double[] {0, 1, 2, 3},
            new double[] {1, 1}));
        final ProfileConvolution c = ProfileConvolution.of(TransportParameters.of(1, 1),
            PiecewiseLinearProfile.of(new double[] {0, 1}, new double[] {1, 1}, ZERO));
        rejects("x", () -> c.value(Double.NaN, 1));
        rejects("t", () -> c.value(0, -1));
        rejects("t", () -> c.gradient(0, Double.POSITIVE_INFINITY));
        rejects("out", () -> c.values(new double[3], 1, new double[2]));
    }

    @Test
    void arraysAreCopied() {
        final double[] n = {0, 1, 2};
        final double[] v = {1, 2, 3};
        final PiecewiseLinearProfile p = PiecewiseLinearProfile.of(n, v, ZERO);
        n[1] = 0.5;
        v[1] = 100;
        assertEquals(2.0, p.valueAt(1.0), 0.0);
        p.nodes()[1] = 7;
        p.values()[1] = 7;
        assertEquals(2.0, p.valueAt(1.0), 0.0);
    }

    @Test
    void initialValueIsTheInterpolantWithMeansAtJumps() {
        // javadoc: at t = 0 the value is the interpolant at x − vt/R = x, the mean of the
        // one-sided values at jumps and at zero-extended ends; the gradient is the slope,
        // the mean of the one-sided slopes at a kink, ±∞ at a jump
        final PiecewiseLinearProfile p = PiecewiseLinearProfile.of(
            new double[] {0, 1, 2, 2, 3}, new double[] {2, 4, 1, 5, 5}, ZERO);
        final ProfileConvolution c = ProfileConvolution.of(TransportParameters.of(3, 0.1)
            .withDecay(0.5), p);
        assertEquals(1.0, c.value(0, 0), 0.0);
        assertEquals(3.0, c.value(0.5, 0), 0.0);
        assertEquals(4.0, c.value(1, 0), 0.0);
        assertEquals(3.0, c.value(2, 0), 0.0);
        assertEquals(2.5, c.value(3, 0), 0.0);
        assertEquals(0.0, c.value(3.5, 0), 0.0);
        assertEquals(2.0, c.gradient(0.5, 0), 0.0);
        assertEquals(0.5 * 2 + 0.5 * -3, c.gradient(1, 0), 0.0);
        assertEquals(Double.POSITIVE_INFINITY, c.gradient(2, 0));
        assertEquals(Double.NEGATIVE_INFINITY, c.gradient(3, 0));
        // grid path at t = 0 is the same interpolant
        final ProfileConvolution u = ProfileConvolution.of(TransportParameters.of(3, 0.1),
            PiecewiseLinearProfile.uniform(0, 1, new double[] {2, 4, 1}, ZERO));
        final double[] out = new double[4];
        u.valuesOnGrid(-0.5, 0.0, out, GridMethod.AUTOMATIC);
        assertEquals(0.0, out[0], 0.0);
        assertEquals(3.0, out[1], 0.0);
        assertEquals(2.5, out[2], 0.0);
        assertEquals(0.0, out[3], 0.0);
    }
}
