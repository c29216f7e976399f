package org.advecta.halfspace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.advecta.solution.Domain;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Invalid input is rejected with a message naming the parameter; t = 0 and batch contracts. */
class HalfSpaceInputTest {

    private static final TransportParameters P = TransportParameters.of(1.0, 0.5);

    private static void rejects(String name, Executable e) {
        final IllegalArgumentException ex = assertThrows(IllegalArgumentException.class, e);
        assertTrue(ex.getMessage().startsWith(name), ex.getMessage());
    }

    @Test
    void rejectsInvalidArguments() {
        rejects("xi", () -> HalfSpaceKernel1D.of(P, Wall.ABSORBING, 0.0));
        rejects("xi", () -> HalfSpaceKernel1D.of(P, Wall.ABSORBING, Double.NaN));
        rejects("xi", () -> HalfSpaceKernel1D.of(P, Wall.ABSORBING, Double.POSITIVE_INFINITY));
        rejects("wall", () -> HalfSpaceKernel1D.of(P, null, 1.0));
        rejects("parameters", () -> HalfSpaceKernel1D.of(null, Wall.ZERO_FLUX, 1.0));
        final HalfSpaceKernel1D k = HalfSpaceKernel1D.of(P, Wall.ZERO_FLUX, 1.0);
        rejects("x", () -> k.value(-1e-300, 1.0));
        rejects("x", () -> k.gradient(Double.NaN, 1.0));
        rejects("t", () -> k.flux(1.0, -1.0));
        rejects("t", () -> k.massOut(Double.NaN));
        rejects("t", () -> k.massInDomain(Double.POSITIVE_INFINITY));
        rejects("out", () -> k.value(new double[2], 1.0, new double[1]));
        rejects("x", () -> k.value(new double[] {1, -1}, 1.0, new double[2]));
        rejects("x0", () -> HalfSpaceKernel2D.of(P, Wall.ABSORBING, WallAxis.X, 0.0, 1.0));
        rejects("y0", () -> HalfSpaceKernel2D.of(P, Wall.ABSORBING, WallAxis.Y, 1.0, -1.0));
        rejects("axis", () -> HalfSpaceKernel2D.of(P, Wall.ABSORBING, WallAxis.Z, 1.0, 1.0));
        rejects("z0", () -> HalfSpaceKernel3D.of(P, Wall.ABSORBING, WallAxis.Z, 1.0, 1.0, 0.0));
        rejects("y", () -> HalfSpaceKernel3D.of(P, Wall.ABSORBING, WallAxis.Y, 1.0, 1.0, 1.0)
            .value(0.0, -0.5, 0.0, 1.0));
        rejects("a", () -> HalfLineStep.of(P, Wall.ABSORBING, -1.0, 1.0));
        rejects("c0", () -> HalfLineStep.of(P, Wall.ABSORBING, 1.0, Double.NaN));
        rejects("b", () -> HalfLineSlug.of(P, Wall.ABSORBING, 1.0, 1.0, 1.0));
        rejects("b", () -> HalfLineSlug.of(P, Wall.ABSORBING, 1.0, Double.POSITIVE_INFINITY, 1.0));
        rejects("x", () -> HalfLineSlug.of(P, Wall.ABSORBING, 1.0, 2.0, 1.0).value(-1.0, 1.0));
    }

    @Test
    void initialData() {
        final HalfSpaceKernel1D k = HalfSpaceKernel1D.of(P, Wall.ABSORBING, 1.0);
        assertEquals(Double.POSITIVE_INFINITY, k.value(1.0, 0.0));
        assertEquals(0.0, k.value(0.5, 0.0));
        assertEquals(1.0, k.massInDomain(0.0));
        assertEquals(0.0, k.massOut(0.0));
        assertEquals(0.0, k.wallFlux(0.0));
        final HalfLineSlug s = HalfLineSlug.of(P, Wall.ABSORBING, 1.0, 2.0, 3.0);
        assertEquals(Domain.HALF_LINE, s.domain());
        assertEquals(3.0, s.value(1.5, 0.0));
        assertEquals(1.5, s.value(2.0, 0.0));
        assertEquals(0.0, s.value(2.5, 0.0));
        assertEquals(0.0, HalfLineStep.of(P, Wall.ABSORBING, 0.0, 3.0).value(0.0, 0.0));
        assertEquals(3.0, HalfLineStep.of(P, Wall.ZERO_FLUX, 0.0, 3.0).value(0.0, 0.0));
    }

    @Test
    void batchEqualsScalar() {
        final double[] x = {0, 0.1, 0.5, 1, 2, 5, 40};
        for (Wall w : Wall.values()) {
            for (double v : new double[] {-3, 0, 3}) {
                final HalfSpaceKernel1D k = HalfSpaceKernel1D.of(TransportParameters.of(v, 0.5),
                    w, 1.0);
                final double[] out = new double[x.length];
                k.value(x, 0.7, out);
                for (int i = 0; i < x.length; i++) {
                    assertEquals(k.value(x[i], 0.7), out[i]);
                }
                final double[] in = x.clone();
                k.value(in, 0.7, in);
                assertEquals(out[3], in[3]);
                final HalfSpaceKernel3D k3 = HalfSpaceKernel3D.of(TransportParameters.of(v, 0.5),
                    w, WallAxis.Z, 0.0, 0.0, 1.0);
                final double[] o3 = new double[x.length];
                k3.value(x, x, x, 0.7, o3);
                for (int i = 0; i < x.length; i++) {
                    assertEquals(k3.value(x[i], x[i], x[i], 0.7), o3[i]);
                }
            }
        }
    }
}
