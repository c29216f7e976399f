package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.advecta.testing.Integrals;
import org.advecta.transport.TransportParameters;

/** Invariants of the convolution routes that must hold for all data and parameters. */
class ConvolutionProperties {

    private static final double U = 0x1.0p-53;

    private static TransportParameters params(double v, double logD, double r, double mu) {
        return TransportParameters.of(v, Math.pow(10, logD)).withRetardation(r).withDecay(mu);
    }

    /** Random nodes on a 1/64 lattice (exact shifts), with occasional jumps. */
    private static PiecewiseLinearProfile profile(long seed, int n, boolean nonNegative,
                                                  PiecewiseLinearProfile.Extension ext) {
        final Random rnd = new Random(seed);
        final double[] nodes = new double[n];
        final double[] vals = new double[n];
        double x = -3 + rnd.nextInt(64) / 64.0;
        for (int i = 0; i < n; i++) {
            // a repeat (jump) now and then, never three in a row
            final boolean jump = i > 1 && nodes[i - 1] != nodes[i - 2] && rnd.nextInt(5) == 0;
            if (i > 0 && !jump) {
                x += (1 + rnd.nextInt(48)) / 64.0;
            }
            nodes[i] = x;
            vals[i] = nonNegative ? (rnd.nextInt(4) == 0 ? 0.0 : rnd.nextDouble() * 3)
                : rnd.nextDouble() * 4 - 2;
        }
        if (nodes[n - 1] == nodes[0]) {
            nodes[n - 1] += 1;
        }
        return PiecewiseLinearProfile.of(nodes, vals, ext);
    }

    private static PiecewiseLinearProfile absolute(PiecewiseLinearProfile p) {
        final double[] v = p.values();
        for (int i = 0; i < v.length; i++) {
            v[i] = Math.abs(v[i]);
        }
        return PiecewiseLinearProfile.of(p.nodes(), v, p.extension());
    }

    @Property(tries = 200)
    void linearity(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                   @ForAll @DoubleRange(min = -5, max = 5) double v,
                   @ForAll @DoubleRange(min = -3, max = 1) double logD,
                   @ForAll @DoubleRange(min = 0, max = 1) double mu,
                   @ForAll @DoubleRange(min = -3, max = 3) double alpha,
                   @ForAll @DoubleRange(min = -3, max = 3) double beta,
                   @ForAll @DoubleRange(min = -6, max = 6) double x,
                   @ForAll @DoubleRange(min = 0.01, max = 5) double t) {
        final TransportParameters p = params(v, logD, 1.5, mu);
        final PiecewiseLinearProfile f = profile(seed, 9, false, PiecewiseLinearProfile.Extension.ZERO);
        final double[] gv = new double[f.size()];
        final Random rnd = new Random(seed + 7);
        for (int i = 0; i < gv.length; i++) {
            gv[i] = rnd.nextDouble() - 0.5;
        }
        final PiecewiseLinearProfile g = PiecewiseLinearProfile.of(f.nodes(), gv, f.extension());
        final double[] sum = new double[f.size()];
        for (int i = 0; i < sum.length; i++) {
            sum[i] = alpha * f.values()[i] + beta * gv[i];
        }
        final PiecewiseLinearProfile combined = PiecewiseLinearProfile.of(f.nodes(), sum,
            f.extension());
        final double lhs = ProfileConvolution.of(p, combined).value(x, t);
        final double rhs = alpha * ProfileConvolution.of(p, f).value(x, t)
            + beta * ProfileConvolution.of(p, g).value(x, t);
        // each evaluation is within 64·2⁻⁵³ of its Σ|contributions| (plus position rounding,
        // identical here: the nodes and x are the same), and forming α·f + β·g rounds the data
        final double scale = Math.abs(alpha) * ProfileConvolution.of(p, absolute(f)).value(x, t)
            + Math.abs(beta) * ProfileConvolution.of(p, absolute(g)).value(x, t);
        assertEquals(rhs, lhs, 256 * U * scale + 1e-300);
    }

    @Property(tries = 60)
    void massIsConservedUpToDecay(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                  @ForAll @DoubleRange(min = -5, max = 5) double v,
                                  @ForAll @DoubleRange(min = -1, max = 0.5) double logD,
                                  @ForAll @DoubleRange(min = 1, max = 3) double r,
                                  @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                  @ForAll @DoubleRange(min = 0.2, max = 3) double t) {
        // ∫ c dx = e^{−μt/R} ∫ φ dξ on the infinite line (μ = 0: conservation)
        final TransportParameters p = params(v, logD, r, mu);
        final PiecewiseLinearProfile f = profile(seed, 8, false, PiecewiseLinearProfile.Extension.ZERO);
        final double[] n = f.nodes();
        final double[] val = f.values();
        double mass = 0;
        double absMass = 0;
        for (int k = 0; k + 1 < n.length; k++) {
            mass += (n[k + 1] - n[k]) * (val[k] + val[k + 1]) / 2;
            absMass += (n[k + 1] - n[k]) * (Math.abs(val[k]) + Math.abs(val[k + 1])) / 2;
        }
        final ProfileConvolution c = ProfileConvolution.of(p, f);
        final double len = Math.sqrt(4 * p.dispersion() * t / r);
        final double drift = v * t / r;
        final double lo = n[0] + drift - 14 * len;
        final double hi = n[n.length - 1] + drift + 14 * len;
        // the trapezoid rule on a step of L/4 is exact far beyond double precision for the
        // Gaussian-smoothed profile (its error decays like exp(−π²L²/h²)); common practice
        final int steps = (int) Math.ceil((hi - lo) / (len / 4));
        final double integral = Integrals.trapezoid(x -> c.value(x, t), lo, hi, steps);
        assertEquals(Math.exp(-mu * t / r) * mass, integral, 1e-12 * absMass + 1e-300);
    }

    @Property(tries = 200)
    void translationInvariance(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                               @ForAll @IntRange(min = -640, max = 640) int shift64,
                               @ForAll @DoubleRange(min = -5, max = 5) double v,
                               @ForAll @DoubleRange(min = -3, max = 1) double logD,
                               @ForAll @IntRange(min = -400, max = 400) int x64,
                               @ForAll @DoubleRange(min = 0.01, max = 5) double t) {
        final TransportParameters p = params(v, logD, 1.0, 0.2);
        final PiecewiseLinearProfile f = profile(seed, 7, false,
            seed % 2 == 0 ? PiecewiseLinearProfile.Extension.ZERO
                : PiecewiseLinearProfile.Extension.CONSTANT);
        final double s = shift64 / 64.0;
        final double[] shifted = f.nodes();
        for (int i = 0; i < shifted.length; i++) {
            shifted[i] += s;
        }
        final PiecewiseLinearProfile g = PiecewiseLinearProfile.of(shifted, f.values(),
            f.extension());
        final double x = x64 / 64.0;
        // nodes and x on the 1/64 lattice: x − ξ is the same double in both, so the
        // results agree to the last bit (positions are the only inputs that move)
        assertEquals(ProfileConvolution.of(p, f).value(x, t),
            ProfileConvolution.of(p, g).value(x + s, t), 0.0);
    }

    @Property(tries = 300)
    void nonNegativeDataGiveNonNegativeSolutions(
            @ForAll @LongRange(min = 1, max = 1_000_000) long seed,
            @ForAll @DoubleRange(min = -50, max = 50) double v,
            @ForAll @DoubleRange(min = -8, max = 2) double logD,
            @ForAll @DoubleRange(min = -30, max = 30) double x,
            @ForAll @DoubleRange(min = 0, max = 10) double t) {
        final TransportParameters p = params(v, logD, 1.0, 0.0);
        for (PiecewiseLinearProfile.Extension ext : PiecewiseLinearProfile.Extension.values()) {
            final double c = ProfileConvolution.of(p, profile(seed, 10, true, ext)).value(x, t);
            assertTrue(c >= 0, "c = " + c);
        }
    }

    @Property(tries = 100)
    void gridPathStaysAboveMinusItsBound(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                         @ForAll @DoubleRange(min = -3, max = 1) double logD,
                                         @ForAll @DoubleRange(min = 0.01, max = 3) double t) {
        final Random rnd = new Random(seed);
        final double[] v = new double[200];
        for (int i = 0; i < v.length; i++) {
            v[i] = rnd.nextInt(3) == 0 ? 0 : rnd.nextDouble();
        }
        final ProfileConvolution c = ProfileConvolution.of(params(1.0, logD, 1.0, 0.0),
            PiecewiseLinearProfile.uniform(0, 0.05, v, PiecewiseLinearProfile.Extension.ZERO));
        final double[] out = new double[300];
        for (GridMethod m : GridMethod.values()) {
            final double bound = c.valuesOnGrid(-2.5, t, out, m);
            for (double o : out) {
                assertTrue(o >= -bound, "value " + o + " bound " + bound);
            }
        }
    }

    @Property(tries = 1000)
    void segmentWeightsSplitTheMassWithoutNegativeParts(
            @ForAll @DoubleRange(min = -45, max = 45) double m,
            @ForAll @DoubleRange(min = -12, max = 3) double logH) {
        final double h = Math.pow(10, logH);
        final double up = SegmentIntegrals.rising(m, h);
        final double down = SegmentIntegrals.rising(-m, h);
        final double mass = SegmentIntegrals.mass(m, h);
        assertTrue(up >= 0 && down >= 0);
        // each weight within 32 + 4κ units, κ ≤ 2·max(y²) + 2 over the segment; where the
        // weights are subnormal, within the absolute 2¹¹ MIN_VALUE that SegmentIntegrals states
        final double y = Math.min(Math.abs(m) + h, 40);
        final double subnormal = mass < Double.MIN_NORMAL ? 0x1.0p11 * Double.MIN_VALUE : 0.0;
        assertEquals(mass, up + down, (64 + 8 * y * y) * U * mass + Double.MIN_VALUE + subnormal);
    }
}
