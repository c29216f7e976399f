package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.LongRange;
import org.advecta.halfspace.Wall;
import org.advecta.internal.GaussLegendre;
import org.advecta.transport.TransportParameters;

/**
 * Invariants of the half-line (wall) kernels for all data and parameters: mass conservation
 * with a zero-flux wall and μ = 0, the wall conditions (c = 0 on an absorbing wall,
 * v·c − D·∂c/∂x = 0 on a zero-flux wall), and mass loss through an absorbing wall.
 */
class WallProperties {

    private static TransportParameters params(double v, double logD, double r, double mu) {
        return TransportParameters.of(v, Math.pow(10, logD)).withRetardation(r).withDecay(mu);
    }

    /** Random non-negative data on [0, 3], nodes on a 1/64 lattice, occasional jumps. */
    private static PiecewiseLinearProfile profile(long seed) {
        final Random rnd = new Random(seed);
        final int n = 5 + rnd.nextInt(6);
        final double[] nodes = new double[n];
        final double[] vals = new double[n];
        double x = rnd.nextInt(3) == 0 ? 0.0 : rnd.nextInt(64) / 64.0;
        for (int i = 0; i < n; i++) {
            final boolean jump = i > 1 && nodes[i - 1] != nodes[i - 2] && rnd.nextInt(5) == 0;
            if (i > 0 && !jump) {
                x += (1 + rnd.nextInt(24)) / 64.0;
            }
            nodes[i] = x;
            vals[i] = rnd.nextInt(4) == 0 ? 0.0 : rnd.nextDouble() * 3;
        }
        if (nodes[n - 1] == nodes[0]) {
            nodes[n - 1] += 1;
        }
        return PiecewiseLinearProfile.of(nodes, vals, PiecewiseLinearProfile.Extension.ZERO);
    }

    private static double initialMass(PiecewiseLinearProfile f) {
        final double[] n = f.nodes();
        final double[] v = f.values();
        double m = 0;
        for (int k = 0; k + 1 < n.length; k++) {
            m += (n[k + 1] - n[k]) * (v[k] + v[k + 1]) / 2;
        }
        return m;
    }

    /**
     * ∫₀^X c(x, t) dx by the 10-point Gauss–Legendre rule on panels of a quarter of the
     * smallest length in play (kernel width, wall layer D/|v|, data spacing 1/64).
     */
    private static double massOf(ProfileConvolution c, double t, double far, double panel) {
        final int n = (int) Math.ceil(far / panel);
        final double w = far / n;
        double sum = 0;
        for (int j = 0; j < n; j++) {
            final double mid = (j + 0.5) * w;
            for (int k = 0; k < GaussLegendre.halfSize(); k++) {
                final double u = 0.5 * w * GaussLegendre.node(k);
                sum += 0.5 * w * GaussLegendre.weight(k) * (c.value(mid - u, t) + c.value(mid + u, t));
            }
        }
        return sum;
    }

    private static double panel(TransportParameters p, double t) {
        final double l = Math.sqrt(4 * p.dispersion() * t / p.retardation());
        final double layer = p.velocity() == 0 ? l : p.dispersion() / Math.abs(p.velocity());
        return Math.min(1.0 / 64, Math.min(l, layer)) / 4;
    }

    @Property(tries = 40)
    void zeroFluxWallConservesMass(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                   @ForAll @DoubleRange(min = -3, max = 3) double v,
                                   @ForAll @DoubleRange(min = -1.5, max = 0) double logD,
                                   @ForAll @DoubleRange(min = 1, max = 3) double r,
                                   @ForAll @DoubleRange(min = 0.05, max = 2) double t) {
        final TransportParameters p = params(v, logD, r, 0.0);
        final PiecewiseLinearProfile f = profile(seed);
        final ProfileConvolution c = ProfileConvolution.of(HalfLineKernel.of(p, Wall.ZERO_FLUX), f);
        final double l = Math.sqrt(4 * p.dispersion() * t / r);
        final double far = f.nodes()[f.size() - 1] + Math.max(0, v * t / r) + 14 * l;
        final double mass = initialMass(f);
        final double integral = massOf(c, t, far, panel(p, t));
        assertEquals(mass, integral, 1e-10 * mass + 1e-300, "mass with a zero-flux wall");
    }

    @Property(tries = 40)
    void absorbingWallLosesMass(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                @ForAll @DoubleRange(min = -3, max = 3) double v,
                                @ForAll @DoubleRange(min = -1.5, max = 0) double logD,
                                @ForAll @DoubleRange(min = 0.05, max = 2) double t) {
        final TransportParameters p = params(v, logD, 1.0, 0.0);
        final PiecewiseLinearProfile f = profile(seed);
        final ProfileConvolution c = ProfileConvolution.of(HalfLineKernel.of(p, Wall.ABSORBING), f);
        final double l = Math.sqrt(4 * p.dispersion() * t);
        final double far = f.nodes()[f.size() - 1] + Math.max(0, v * t) + 14 * l;
        final double mass = initialMass(f);
        final double integral = massOf(c, t, far, panel(p, t));
        assertTrue(integral <= mass * (1 + 1e-12) && integral >= -1e-12 * mass,
            "mass " + integral + " of " + mass);
    }

    @Property(tries = 300)
    void wallConditionsHold(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                            @ForAll @DoubleRange(min = -20, max = 20) double v,
                            @ForAll @DoubleRange(min = -3, max = 1) double logD,
                            @ForAll @DoubleRange(min = 1, max = 3) double r,
                            @ForAll @DoubleRange(min = 0, max = 1) double mu,
                            @ForAll @DoubleRange(min = 0.01, max = 3) double t) {
        final TransportParameters p = params(v, logD, r, mu);
        final PiecewiseLinearProfile f = profile(seed);
        final double[] abs = f.values();
        double max = 0;
        for (double a : abs) {
            max = Math.max(max, a);
        }
        // c = 0 on an absorbing wall, to rounding of the free part (≤ max|f|·decay)
        final ProfileConvolution a = ProfileConvolution.of(HalfLineKernel.of(p, Wall.ABSORBING), f);
        assertEquals(0.0, a.value(0, t), 1e-13 * max, "absorbing wall value");
        // v·c − D·∂c/∂x = 0 on a zero-flux wall, relative to the two terms' sizes
        final ProfileConvolution z = ProfileConvolution.of(HalfLineKernel.of(p, Wall.ZERO_FLUX), f);
        final double c0 = z.value(0, t);
        final double g0 = z.gradient(0, t);
        final double dd = p.dispersion();
        final double l = Math.sqrt(4 * dd * t / r);
        // tolerance: relative to the two terms, plus rounding of the free part's flux scale
        final double tol = 1e-11 * (Math.abs(v * c0) + Math.abs(dd * g0))
            + 1e-14 * max * (Math.abs(v) + dd / l);
        assertEquals(0.0, v * c0 - dd * g0, tol, "zero-flux wall: v c = " + v * c0
            + ", D c_x = " + dd * g0);
    }

    @Property(tries = 300)
    void nonNegativeDataStayNonNegative(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                        @ForAll @DoubleRange(min = -30, max = 30) double v,
                                        @ForAll @DoubleRange(min = -4, max = 1) double logD,
                                        @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                        @ForAll @DoubleRange(min = 0, max = 3) double x,
                                        @ForAll @DoubleRange(min = 0.01, max = 3) double t) {
        final TransportParameters p = params(v, logD, 1.5, mu);
        final PiecewiseLinearProfile f = profile(seed);
        // a Green's function is non-negative; the wall terms may cancel against the free
        // part near the wall, so the allowance is rounding of the free part
        final double freePart = ProfileConvolution.of(p, f).value(x, t);
        for (Wall wall : Wall.values()) {
            final double c = ProfileConvolution.of(HalfLineKernel.of(p, wall), f).value(x, t);
            assertTrue(c >= -1e-13 * freePart - 1e-300, wall + ": " + c + " (free part "
                + freePart + ")");
        }
    }
}
