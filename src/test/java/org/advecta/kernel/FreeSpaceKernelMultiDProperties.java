package org.advecta.kernel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.advecta.testing.Integrals;
import org.advecta.transport.TransportParameters;

/**
 * Invariants of the two- and three-dimensional Green's functions: separability into
 * one-dimensional kernels, mass, moments, the equation itself, and consistency of gradient,
 * flux and batch evaluation.
 */
class FreeSpaceKernelMultiDProperties {

    private static TransportParameters params(double v, double logDL, double ratioT,
                                              double ratioV, double r, double mu) {
        final double dl = Math.pow(10, logDL);
        return TransportParameters.of(v, dl).withDispersion(dl, dl * ratioT, dl * ratioV)
            .withRetardation(r).withDecay(mu);
    }

    private static double sigma(double d, double r, double t) {
        return Math.sqrt(2 * d * t / r);
    }

    /** One-dimensional kernel along an axis with dispersion d, without drift or decay. */
    private static double axis(double d, double r, double offset, double t) {
        return FreeSpaceKernel1D.of(TransportParameters.of(0.0, d).withRetardation(r), 0.0)
            .value(offset, t);
    }

    @Property(tries = 300)
    void threeDimensionalKernelIsTheProductOfOneDimensionalOnes(
            @ForAll @DoubleRange(min = -10, max = 10) double v,
            @ForAll @DoubleRange(min = -3, max = 1) double logDL,
            @ForAll @DoubleRange(min = 0.01, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 0.01, max = 1) double ratioV,
            @ForAll @DoubleRange(min = 1, max = 5) double r,
            @ForAll @DoubleRange(min = 0, max = 1) double mu,
            @ForAll @DoubleRange(min = -1, max = 1) double logT,
            @ForAll @DoubleRange(min = -3, max = 3) double wx,
            @ForAll @DoubleRange(min = -3, max = 3) double wy,
            @ForAll @DoubleRange(min = -3, max = 3) double wz) {
        final TransportParameters p = params(v, logDL, ratioT, ratioV, r, mu);
        final double t = Math.pow(10, logT);
        final double dl = p.dispersion();
        final double dt = p.transverseDispersion();
        final double dv = p.verticalDispersion();
        final double x = v * t / r + wx * sigma(dl, r, t);
        final double y = wy * sigma(dt, r, t);
        final double z = wz * sigma(dv, r, t);
        final double along = FreeSpaceKernel1D.of(p, 0.0).value(x, t);
        final double expected3 = along * axis(dt, r, y, t) * axis(dv, r, z, t);
        final double expected2 = along * axis(dt, r, y, t);
        // Separation of variables (the operator is a sum of one-axis operators): exact
        // identity; the two sides round differently, by a few ulp times κ ≈ 1 + Σw².
        final double tol = 64 * (1 + wx * wx + wy * wy + wz * wz);
        final double g3 = FreeSpaceKernel3D.of(p, 0, 0, 0).value(x, y, z, t);
        final double g2 = FreeSpaceKernel2D.of(p, 0, 0).value(x, y, t);
        assertEquals(expected3, g3, tol * Math.ulp(expected3));
        assertEquals(expected2, g2, tol * Math.ulp(expected2));
    }

    @Property(tries = 40)
    void twoDimensionalMassAndMoments(@ForAll @DoubleRange(min = -5, max = 5) double v,
                                      @ForAll @DoubleRange(min = -2, max = 1) double logDL,
                                      @ForAll @DoubleRange(min = 0.05, max = 1) double ratioT,
                                      @ForAll @DoubleRange(min = 1, max = 4) double r,
                                      @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                      @ForAll @DoubleRange(min = -1, max = 1) double logT) {
        final TransportParameters p = params(v, logDL, ratioT, 1.0, r, mu);
        final double t = Math.pow(10, logT);
        final FreeSpaceKernel2D g = FreeSpaceKernel2D.of(p, 1.0, -2.0);
        final double cx = 1.0 + v * t / r;
        final double sx = sigma(p.dispersion(), r, t);
        final double sy = sigma(p.transverseDispersion(), r, t);
        final double mass = Integrals.trapezoid(
            y -> Integrals.trapezoid(x -> g.value(x, y, t), cx - 10 * sx, cx + 10 * sx, 80),
            -2.0 - 10 * sy, -2.0 + 10 * sy, 80);
        final double varY = Integrals.trapezoid(
            y -> (y + 2.0) * (y + 2.0)
                * Integrals.trapezoid(x -> g.value(x, y, t), cx - 10 * sx, cx + 10 * sx, 80),
            -2.0 - 10 * sy, -2.0 + 10 * sy, 80) / mass;
        // ∫∫G = exp(−μt/R); transverse variance 2 D_T t / R.
        assertEquals(Math.exp(-mu * t / r), mass, 1e-12);
        assertEquals(sy * sy, varY, 1e-11 * sy * sy);
    }

    /** v = μ = 0 with every |w_i| = 1: every term of the equation is 0. */
    @Example
    void threeDimensionalKernelSatisfiesTheEquationWhereEveryTermVanishes() {
        threeDimensionalKernelSatisfiesTheEquation(0.0, 0.0, 1.0, 1.0, 1.0, 0.0, 0.0, 1.0, -1.0,
            1.0);
    }

    @Property(tries = 150)
    void threeDimensionalKernelSatisfiesTheEquation(
            @ForAll @DoubleRange(min = -10, max = 10) double v,
            @ForAll @DoubleRange(min = -2, max = 1) double logDL,
            @ForAll @DoubleRange(min = 0.05, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 0.05, max = 1) double ratioV,
            @ForAll @DoubleRange(min = 1, max = 5) double r,
            @ForAll @DoubleRange(min = 0, max = 1) double mu,
            @ForAll @DoubleRange(min = -1, max = 1) double logT,
            @ForAll @DoubleRange(min = -3, max = 3) double wx,
            @ForAll @DoubleRange(min = -3, max = 3) double wy,
            @ForAll @DoubleRange(min = -3, max = 3) double wz) {
        final TransportParameters p = params(v, logDL, ratioT, ratioV, r, mu);
        final double t = Math.pow(10, logT);
        final FreeSpaceKernel3D g = FreeSpaceKernel3D.of(p, 0.5, 0.25, -0.5);
        final double[] d = {p.dispersion(), p.transverseDispersion(), p.verticalDispersion()};
        final double x = 0.5 + v * t / r + wx * sigma(d[0], r, t);
        final double y = 0.25 + wy * sigma(d[1], r, t);
        final double z = -0.5 + wz * sigma(d[2], r, t);
        final double ht = 2e-4 * Math.min(t, sigma(d[0], r, t) * r / Math.max(Math.abs(v), 1e-300));
        final double gt = (-g.value(x, y, z, t + 2 * ht) + 8 * g.value(x, y, z, t + ht)
            - 8 * g.value(x, y, z, t - ht) + g.value(x, y, z, t - 2 * ht)) / (12 * ht);
        final double hx = 2e-4 * sigma(d[0], r, t);
        final double hy = 2e-4 * sigma(d[1], r, t);
        final double hz = 2e-4 * sigma(d[2], r, t);
        final double gxx = (-g.gradientX(x + 2 * hx, y, z, t) + 8 * g.gradientX(x + hx, y, z, t)
            - 8 * g.gradientX(x - hx, y, z, t) + g.gradientX(x - 2 * hx, y, z, t)) / (12 * hx);
        final double gyy = (-g.gradientY(x, y + 2 * hy, z, t) + 8 * g.gradientY(x, y + hy, z, t)
            - 8 * g.gradientY(x, y - hy, z, t) + g.gradientY(x, y - 2 * hy, z, t)) / (12 * hy);
        final double gzz = (-g.gradientZ(x, y, z + 2 * hz, t) + 8 * g.gradientZ(x, y, z + hz, t)
            - 8 * g.gradientZ(x, y, z - hz, t) + g.gradientZ(x, y, z - 2 * hz, t)) / (12 * hz);
        final double c = g.value(x, y, z, t);
        final double gx = g.gradientX(x, y, z, t);
        final double residual = r * gt - d[0] * gxx - d[1] * gyy - d[2] * gzz + v * gx + mu * c;
        final double scale = Math.abs(r * gt) + Math.abs(d[0] * gxx) + Math.abs(d[1] * gyy)
            + Math.abs(d[2] * gzz) + Math.abs(v * gx) + Math.abs(mu * c);
        // plus the differences' rounding, a few ε of the values over the step (|G_i| ≤
        // (1 + |w_i|)|G|/σ_i): where every term vanishes (v = μ = 0 with every |w_i| = 1)
        // the scale alone is rounding and would demand 0
        final double noise = 1e-14 * Math.abs(c) * (r / ht
            + d[0] * (1 + Math.abs(wx)) / (sigma(d[0], r, t) * hx)
            + d[1] * (1 + Math.abs(wy)) / (sigma(d[1], r, t) * hy)
            + d[2] * (1 + Math.abs(wz)) / (sigma(d[2], r, t) * hz));
        assertEquals(0.0, residual, 1e-8 * scale + noise);
    }

    @Property(tries = 50)
    void batchEqualsScalarAndFluxIsAdvectionMinusDispersion(
            @ForAll @DoubleRange(min = -10, max = 10) double v,
            @ForAll @DoubleRange(min = -2, max = 1) double logDL,
            @ForAll @DoubleRange(min = 0.05, max = 1) double ratioT,
            @ForAll @DoubleRange(min = -1, max = 1) double logT) {
        final TransportParameters p = params(v, logDL, ratioT, ratioT / 2, 2.0, 0.1);
        final double t = Math.pow(10, logT);
        final FreeSpaceKernel2D g2 = FreeSpaceKernel2D.of(p, 0, 0);
        final FreeSpaceKernel3D g3 = FreeSpaceKernel3D.of(p, 0, 0, 0);
        final int n = 64;
        final double[] x = new double[n];
        final double[] y = new double[n];
        final double[] z = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = v * t / 2 + (i % 8 - 4) * sigma(p.dispersion(), 2, t) / 2;
            y[i] = (i / 8 - 4) * sigma(p.transverseDispersion(), 2, t) / 2;
            z[i] = ((i * 3) % 8 - 4) * sigma(p.verticalDispersion(), 2, t) / 2;
        }
        final double[] v2 = new double[n];
        final double[] gx2 = new double[n];
        final double[] gy2 = new double[n];
        final double[] fx2 = new double[n];
        final double[] fy2 = new double[n];
        g2.value(x, y, t, v2);
        g2.gradient(x, y, t, gx2, gy2);
        g2.flux(x, y, t, fx2, fy2);
        final double[] v3 = new double[n];
        final double[][] grad3 = new double[3][n];
        final double[][] flux3 = new double[3][n];
        g3.value(x, y, z, t, v3);
        g3.gradient(x, y, z, t, grad3);
        g3.flux(x, y, z, t, flux3);
        for (int i = 0; i < n; i++) {
            assertEquals(g2.value(x[i], y[i], t), v2[i], 0.0);
            assertEquals(g2.gradientX(x[i], y[i], t), gx2[i], 0.0);
            assertEquals(g2.gradientY(x[i], y[i], t), gy2[i], 0.0);
            assertEquals(g2.fluxX(x[i], y[i], t), fx2[i], 0.0);
            assertEquals(g2.fluxY(x[i], y[i], t), fy2[i], 0.0);
            assertEquals(-p.transverseDispersion() * gy2[i], fy2[i], 0.0);
            final double advDisp = v * v2[i] - p.dispersion() * gx2[i];
            assertEquals(advDisp, fx2[i],
                1e-13 * (Math.abs(v * v2[i]) + Math.abs(p.dispersion() * gx2[i])));
            assertEquals(g3.value(x[i], y[i], z[i], t), v3[i], 0.0);
            assertEquals(g3.gradientX(x[i], y[i], z[i], t), grad3[0][i], 0.0);
            assertEquals(g3.gradientY(x[i], y[i], z[i], t), grad3[1][i], 0.0);
            assertEquals(g3.gradientZ(x[i], y[i], z[i], t), grad3[2][i], 0.0);
            assertEquals(g3.fluxX(x[i], y[i], z[i], t), flux3[0][i], 0.0);
            assertEquals(g3.fluxY(x[i], y[i], z[i], t), flux3[1][i], 0.0);
            assertEquals(g3.fluxZ(x[i], y[i], z[i], t), flux3[2][i], 0.0);
        }
    }

    @Property(tries = 300)
    void neverNaNOnValidInput(@ForAll @DoubleRange(min = -1e8, max = 1e8) double v,
                              @ForAll @DoubleRange(min = -12, max = 8) double logDL,
                              @ForAll @DoubleRange(min = -6, max = 0) double logRatioT,
                              @ForAll @DoubleRange(min = 1, max = 1e3) double r,
                              @ForAll @DoubleRange(min = 0, max = 1e3) double mu,
                              @ForAll @DoubleRange(min = -12, max = 8) double logT,
                              @ForAll @DoubleRange(min = -1e6, max = 1e6) double x,
                              @ForAll @DoubleRange(min = -1e3, max = 1e3) double y) {
        final double ratioT = Math.pow(10, logRatioT);
        final TransportParameters p = params(v, logDL, ratioT, ratioT, r, mu);
        final double t = Math.pow(10, logT);
        final double c3 = FreeSpaceKernel3D.of(p, 0, 0, 0).value(x, y, y, t);
        final double c2 = FreeSpaceKernel2D.of(p, 0, 0).value(x, y, t);
        assertTrue(c3 >= 0 && c3 < Double.POSITIVE_INFINITY, () -> "3D value " + c3);
        assertTrue(c2 >= 0 && c2 < Double.POSITIVE_INFINITY, () -> "2D value " + c2);
        final FreeSpaceKernel3D g = FreeSpaceKernel3D.of(p, 0, 0, 0);
        assertTrue(!Double.isNaN(g.fluxX(x, y, y, t)) && !Double.isNaN(g.gradientZ(x, y, y, t)));
    }
}
