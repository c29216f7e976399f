package org.advecta.kernel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The documented special cases and the rejection of invalid input. */
class FreeSpaceKernelTest {

    private static final TransportParameters P = TransportParameters.of(2.0, 0.5)
        .withDispersion(0.5, 0.1, 0.05).withRetardation(2.0).withDecay(0.1);
    private static final FreeSpaceKernel1D K1 = FreeSpaceKernel1D.of(P, 1.0);
    private static final FreeSpaceKernel2D K2 = FreeSpaceKernel2D.of(P, 1.0, 2.0);
    private static final FreeSpaceKernel3D K3 = FreeSpaceKernel3D.of(P, 1.0, 2.0, 3.0);

    @Test
    void atTimeZeroTheKernelIsTheDelta() {
        // Javadoc: "At t = 0 every method returns the limit t → 0⁺ at fixed x".
        assertEquals(Double.POSITIVE_INFINITY, K1.value(1.0, 0));
        assertEquals(0.0, K1.value(1.0 + 1e-12, 0));
        assertEquals(0.0, K1.gradient(1.0, 0));
        assertEquals(0.0, K1.gradient(0.5, 0));
        assertEquals(Double.POSITIVE_INFINITY, K1.flux(1.0, 0), "v > 0: flux v·∞");
        assertEquals(0.0, K1.flux(0.0, 0));
        assertEquals(0.0, FreeSpaceKernel1D.of(TransportParameters.of(0, 1), 0).flux(0, 0),
            "v = 0: no flux");
        assertEquals(Double.NEGATIVE_INFINITY,
            FreeSpaceKernel1D.of(TransportParameters.of(-1, 1), 0).flux(0, 0));
        assertEquals(Double.POSITIVE_INFINITY, K2.value(1.0, 2.0, 0));
        assertEquals(0.0, K2.value(1.0, 2.5, 0));
        assertEquals(0.0, K2.gradientY(1.0, 2.0, 0));
        assertEquals(Double.POSITIVE_INFINITY, K3.value(1.0, 2.0, 3.0, 0));
        assertEquals(0.0, K3.value(1.0, 2.0, 3.5, 0));
        assertEquals(0.0, Math.abs(K3.fluxZ(1.0, 2.0, 3.0, 0)), "−D_V·0 is a signed zero");
        final double[] out = new double[2];
        K1.value(new double[] {1.0, 3.0}, 0, out);
        assertEquals(Double.POSITIVE_INFINITY, out[0]);
        assertEquals(0.0, out[1]);
    }

    @Test
    void aSpreadBelowTwoToTheMinus600IsTheDeltaAboutTheMovingCentre() {
        // 4Dt/R = 4·0.5·t/2 = t: just below and just above the documented threshold.
        final double below = Math.nextDown(0x1.0p-600);
        final double above = 0x1.0p-600;
        final double centreBelow = Math.fma(1.0, below, 1.0);
        assertEquals(Double.POSITIVE_INFINITY, K1.value(centreBelow, below));
        assertEquals(0.0, K1.value(1.5, below));
        final double peak = K1.value(Math.fma(1.0, above, 1.0), above);
        // Just above it the kernel is an ordinary number: 1/√(π·2⁻⁶⁰⁰) = 2³⁰⁰/√π.
        assertEquals(0x1.0p300 / Math.sqrt(Math.PI), peak, 1e-15 * peak);
    }

    @Test
    void farTailsUnderflowToZeroAndNeverToNaN() {
        final double t = 1.0;
        // ξ²R/(4Dt) = 1e6 ⇒ exp(−1e6): far below the smallest double.
        final double x = 1.0 + t + 1000.0;
        assertEquals(0.0, K1.value(x, t));
        // downstream of the centre the gradient is negative: a signed zero −0.0 is right
        assertEquals(-0.0, K1.gradient(x, t));
        assertEquals(0.0, Math.abs(K1.flux(x, t)));
        assertEquals(0.0, K1.value(1e300, t));
        assertEquals(0.0, K3.value(1e300, -1e300, 1e300, t));
    }

    @ParameterizedTest
    @ValueSource(doubles = {-1e-300, -1, Double.NaN, Double.POSITIVE_INFINITY,
        Double.NEGATIVE_INFINITY})
    void invalidTimesAreRejected(double t) {
        assertRejected("t", () -> K1.value(0, t));
        assertRejected("t", () -> K1.gradient(0, t));
        assertRejected("t", () -> K1.flux(0, t));
        assertRejected("t", () -> K1.value(new double[1], t, new double[1]));
        assertRejected("t", () -> K2.value(0, 0, t));
        assertRejected("t", () -> K3.value(0, 0, 0, t));
        assertRejected("t", () -> K3.fluxY(0, 0, 0, t));
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
    void nonFiniteCoordinatesAreRejected(double bad) {
        assertRejected("x", () -> K1.value(bad, 1));
        assertRejected("x", () -> K1.value(new double[] {0, bad}, 1, new double[2]));
        assertRejected("x", () -> K1.gradient(new double[] {bad}, 1, new double[1]));
        assertRejected("y", () -> K2.value(0, bad, 1));
        assertRejected("y", () -> K2.value(new double[] {0}, new double[] {bad}, 1,
            new double[1]));
        assertRejected("z", () -> K3.gradientZ(0, 0, bad, 1));
        assertRejected("x0", () -> FreeSpaceKernel1D.of(P, bad));
        assertRejected("y0", () -> FreeSpaceKernel2D.of(P, 0, bad));
        assertRejected("z0", () -> FreeSpaceKernel3D.of(P, 0, 0, bad));
    }

    @Test
    void badArraysAreRejected() {
        assertRejected("out", () -> K1.value(new double[3], 1, new double[2]));
        assertRejected("x", () -> K1.value(null, 1, new double[2]));
        assertRejected("y", () -> K2.value(new double[3], new double[2], 1, new double[3]));
        final double[] same = new double[2];
        assertThrows(IllegalArgumentException.class,
            () -> K2.gradient(new double[2], new double[2], 1, same, same));
        assertThrows(IllegalArgumentException.class,
            () -> K3.flux(new double[2], new double[2], new double[2], 1,
                new double[][] {same, new double[2], same}));
        assertThrows(IllegalArgumentException.class,
            () -> K3.flux(new double[2], new double[2], new double[2], 1, new double[2][]));
        assertThrows(IllegalArgumentException.class, () -> FreeSpaceKernel1D.of(null, 0));
    }

    private static void assertRejected(String name, Runnable call) {
        final IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            call::run);
        assertTrue(e.getMessage().startsWith(name), e::getMessage);
    }
}
