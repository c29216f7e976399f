package org.advecta.halfspace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.advecta.kernel.FreeSpaceKernel1D;
import org.advecta.kernel.FreeSpaceKernel3D;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.transport.TransportParameters;

/** Invariants of the 2D/3D kernels and of the half-line step and box. */
class HalfSpaceMultiDimensionProperties {

    private static TransportParameters params(double v, double r, double mu) {
        return TransportParameters.of(v, 0.8).withDispersion(0.8, 0.1, 0.03)
            .withRetardation(r).withDecay(mu);
    }

    @Property(tries = 300)
    void wallConditionsIn3d(@ForAll boolean absorbing, @ForAll @IntRange(min = 0, max = 2) int ax,
                            @ForAll @DoubleRange(min = -1e4, max = 1e4) double v,
                            @ForAll @DoubleRange(min = 1, max = 3) double r,
                            @ForAll @DoubleRange(min = 0, max = 1) double mu,
                            @ForAll @DoubleRange(min = 0, max = 3) double u,
                            @ForAll @DoubleRange(min = -1, max = 1) double w,
                            @ForAll @DoubleRange(min = 0.01, max = 3) double t) {
        final WallAxis axis = WallAxis.values()[ax];
        final Wall wall = absorbing ? Wall.ABSORBING : Wall.ZERO_FLUX;
        final HalfSpaceKernel3D k = HalfSpaceKernel3D.of(params(v, r, mu), wall, axis, 0.4, 0.3,
            0.2);
        final double x = axis == WallAxis.X ? 0 : u;
        final double y = axis == WallAxis.Y ? 0 : w;
        final double z = axis == WallAxis.Z ? 0 : 0.5 * w;
        if (absorbing) {
            assertEquals(0.0, k.value(x, y, z, t));
        } else if (axis == WallAxis.X) {
            assertEquals(0.0, k.fluxX(x, y, z, t));
        } else if (axis == WallAxis.Y) {
            assertEquals(0.0, k.gradientY(x, y, z, t));
        } else {
            assertEquals(0.0, k.gradientZ(x, y, z, t));
        }
        final double c = k.value(u, Math.abs(w), Math.abs(w), t);
        assertTrue(c >= 0 && c < Double.POSITIVE_INFINITY, "c = " + c);
    }

    @Property(tries = 300)
    void productOfOneDimensionalSolutions(@ForAll boolean absorbing,
                                          @ForAll @IntRange(min = 0, max = 2) int ax,
                                          @ForAll @DoubleRange(min = -3, max = 3) double v,
                                          @ForAll @DoubleRange(min = 1, max = 3) double r,
                                          @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                          @ForAll @DoubleRange(min = 0, max = 3) double x,
                                          @ForAll @DoubleRange(min = 0, max = 1) double y,
                                          @ForAll @DoubleRange(min = 0, max = 1) double z,
                                          @ForAll @DoubleRange(min = 0.05, max = 3) double t) {
        // c = (1D factor along the wall normal) × free factors; the free ones are the free-space
        // kernel of the other axes (a 3D free kernel divided by the 1D kernel along the normal)
        final WallAxis axis = WallAxis.values()[ax];
        final Wall wall = absorbing ? Wall.ABSORBING : Wall.ZERO_FLUX;
        final TransportParameters p = params(v, r, mu);
        final double x0 = 0.4;
        final double y0 = 0.3;
        final double z0 = 0.2;
        final double c = HalfSpaceKernel3D.of(p, wall, axis, x0, y0, z0).value(x, y, z, t);
        final double free3 = FreeSpaceKernel3D.of(p, x0, y0, z0).value(x, y, z, t);
        final double normalFree;
        final double normalHalf;
        switch (axis) {
            case X:
                normalFree = FreeSpaceKernel1D.of(p, x0).value(x, t);
                normalHalf = HalfSpaceKernel1D.of(p, wall, x0).value(x, t);
                break;
            case Y: {
                final TransportParameters q = TransportParameters.of(0, 0.1).withRetardation(r);
                normalFree = FreeSpaceKernel1D.of(q, y0).value(y, t);
                normalHalf = HalfSpaceKernel1D.of(q, wall, y0).value(y, t);
                break;
            }
            default: {
                final TransportParameters q = TransportParameters.of(0, 0.03).withRetardation(r);
                normalFree = FreeSpaceKernel1D.of(q, z0).value(z, t);
                normalHalf = HalfSpaceKernel1D.of(q, wall, z0).value(z, t);
                break;
            }
        }
        if (normalFree < 1e-200 || free3 < 1e-200) {
            return;
        }
        final double expected = free3 / normalFree * normalHalf;
        // each factor within max(16, 2κ) ulp; κ of a Gaussian factor ≤ 2q + 3 with q ≤ 40 here
        assertEquals(expected, c, 1e-11 * Math.abs(expected) + 1e-300);
    }

    @Property(tries = 200)
    void stepFromTheWallIsAFlushedInlet(@ForAll boolean absorbing,
                                        @ForAll @DoubleRange(min = 0.05, max = 5) double v,
                                        @ForAll @DoubleRange(min = 1, max = 3) double r,
                                        @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                        @ForAll @DoubleRange(min = 0, max = 6) double x,
                                        @ForAll @DoubleRange(min = 0.05, max = 4) double t) {
        // a = 0: a loaded column flushed by clean water; the absorbing wall is the first-type
        // inlet c(0, t) = 0, the zero-flux wall the third-type inlet v c − D c_x = 0 (v > 0),
        // both with initial concentration C₀ (Ogata–Banks; Lindstrom et al. 1967)
        final TransportParameters p = TransportParameters.of(v, 0.6).withRetardation(r)
            .withDecay(mu);
        final double c = HalfLineStep.of(p, absorbing ? Wall.ABSORBING : Wall.ZERO_FLUX, 0, 2.0)
            .value(x, t);
        final double expected = absorbing
            ? FirstTypeInlet.of(p, InletInput.constant(0)).withInitialConcentration(2.0).value(x, t)
            : ThirdTypeInlet.of(p, InletInput.constant(0)).withInitialConcentration(2.0).value(x, t);
        assertEquals(expected, c, 1e-12 * Math.abs(expected) + 1e-300);
    }

    @Property(tries = 100)
    void boxIsADifferenceOfStepsAndConservesMass(@ForAll boolean absorbing,
                                                 @ForAll @DoubleRange(min = -3, max = 3) double v,
                                                 @ForAll @DoubleRange(min = 0, max = 2) double a,
                                                 @ForAll @DoubleRange(min = 0.01, max = 3) double w,
                                                 @ForAll @DoubleRange(min = 0, max = 6) double x,
                                                 @ForAll @DoubleRange(min = 0.05, max = 3) double t) {
        final TransportParameters p = TransportParameters.of(v, 0.5);
        final Wall wall = absorbing ? Wall.ABSORBING : Wall.ZERO_FLUX;
        final double b = a + w;
        final double box = HalfLineSlug.of(p, wall, a, b, 1.0).value(x, t);
        final double sa = HalfLineStep.of(p, wall, a, 1.0).value(x, t);
        final double sb = HalfLineStep.of(p, wall, b, 1.0).value(x, t);
        assertTrue(box >= 0, "box = " + box);
        assertEquals(sa - sb, box, 1e-12 * (Math.abs(sa) + Math.abs(sb)) + 1e-300);
        // the gradient is the derivative of the value (fourth-order difference)
        final double len = Math.sqrt(4 * 0.5 * t);
        final double h = 1e-3 * Math.min(Math.max(x, 1e-3), len);
        final double xc = Math.max(x, 2 * h);
        final HalfLineSlug s = HalfLineSlug.of(p, wall, a, b, 1.0);
        final double fd = (-s.value(xc + 2 * h, t) + 8 * s.value(xc + h, t)
            - 8 * s.value(xc - h, t) + s.value(xc - 2 * h, t)) / (12 * h);
        final double g = s.gradient(xc, t);
        assertEquals(g, fd, 1e-6 * (Math.abs(g) + 1 / len) + 1e-300);
    }

    @Property(tries = 100)
    void stepAndBoxSatisfyTheEquationAndTheWall(@ForAll boolean absorbing, @ForAll boolean box,
                                                @ForAll @DoubleRange(min = -5, max = 5) double v,
                                                @ForAll @DoubleRange(min = 1, max = 3) double r,
                                                @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                                @ForAll @DoubleRange(min = 0, max = 2) double a,
                                                @ForAll @DoubleRange(min = 0.05, max = 6) double x,
                                                @ForAll @DoubleRange(min = 0.1, max = 4) double t) {
        final double d = 0.4;
        final TransportParameters p = TransportParameters.of(v, d).withRetardation(r)
            .withDecay(mu);
        final Wall wall = absorbing ? Wall.ABSORBING : Wall.ZERO_FLUX;
        final Solution1D c = box ? HalfLineSlug.of(p, wall, a, a + 1.5, 2.0)
            : HalfLineStep.of(p, wall, a, 2.0);
        // wall condition
        if (absorbing) {
            assertEquals(0.0, c.value(0, t));
        } else {
            final double vc = v * c.value(0, t);
            final double dcx = d * c.gradient(0, t);
            assertEquals(0.0, vc - dcx, 1e-12 * Math.max(Math.abs(vc), Math.abs(dcx)) + 1e-300);
        }
        // PDE residual, fourth-order differences as for the kernels
        final double len = Math.sqrt(4 * d * t / r);
        final double ht = 1e-3 * Math.min(t, len * r / Math.max(Math.abs(v), 1e-300));
        final double hx = 1e-3 * Math.min(x, len);
        final double ct = (-c.value(x, t + 2 * ht) + 8 * c.value(x, t + ht)
            - 8 * c.value(x, t - ht) + c.value(x, t - 2 * ht)) / (12 * ht);
        final double cxx = (-c.gradient(x + 2 * hx, t) + 8 * c.gradient(x + hx, t)
            - 8 * c.gradient(x - hx, t) + c.gradient(x - 2 * hx, t)) / (12 * hx);
        final double cx = c.gradient(x, t);
        final double cv = c.value(x, t);
        final double residual = r * ct - d * cxx + v * cx + mu * cv;
        final double scale = Math.abs(r * ct) + Math.abs(d * cxx) + Math.abs(v * cx)
            + Math.abs(mu * cv);
        final double noise = 1e-14 * 2 * (r / ht + d / (len * hx) + Math.abs(v) / len);
        assertEquals(0.0, residual, 1e-6 * scale + noise, () -> "c = " + cv);
    }

    @Property(tries = 300)
    void finiteAtExtremes(@ForAll boolean absorbing, @ForAll boolean box,
                          @ForAll @DoubleRange(min = -1e8, max = 1e8) double v,
                          @ForAll @DoubleRange(min = -3, max = 2) double logD,
                          @ForAll @DoubleRange(min = 0, max = 10) double mu,
                          @ForAll @DoubleRange(min = 0, max = 5) double a,
                          @ForAll @DoubleRange(min = -6, max = 1) double logWidth,
                          @ForAll @DoubleRange(min = 0, max = 100) double x,
                          @ForAll @DoubleRange(min = -9, max = 2) double logT) {
        // no NaN or infinity on valid input, and a non-negative value (positive initial data);
        // at most C₀ (maximum principle) unless a zero-flux wall piles up inflowing solute
        final TransportParameters p = TransportParameters.of(v, Math.pow(10, logD)).withDecay(mu);
        final Wall wall = absorbing ? Wall.ABSORBING : Wall.ZERO_FLUX;
        final Solution1D c = box ? HalfLineSlug.of(p, wall, a, a + Math.pow(10, logWidth), 1.0)
            : HalfLineStep.of(p, wall, a, 1.0);
        final double t = Math.pow(10, logT);
        final double value = c.value(x, t);
        assertTrue(value >= 0 && value < Double.POSITIVE_INFINITY, "c = " + value);
        if (absorbing || v >= 0) {
            assertTrue(value <= 1 + 1e-12, "c = " + value);
        }
        assertTrue(Double.isFinite(c.gradient(x, t)), "gradient not finite");
    }
}
