package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.advecta.halfspace.Wall;
import org.advecta.transport.TransportParameters;

/**
 * The uniform-grid path beside a wall ({@link ProfileConvolution#valuesOnGrid} with a
 * {@link HalfLineKernel}) for all parameters: equal to the per-point path within the returned
 * bound (both walls, either sign of v with Péclet numbers |vt/R|/L up to 1e8, R and μ, grids
 * from the wall or away from it, both extensions, every method), positivity for non-negative
 * data, and mass conservation beside a zero-flux wall with μ = 0.
 */
class WallGridProperties {

    private static final double DX = 0.01;

    /** Signed Péclet number in widths, log-uniform in magnitude over [1e-3, 1e8], or 0. */
    private static double pe(double logPe, int sign) {
        return sign == 0 ? 0.0 : sign * Math.pow(10, logPe);
    }

    @Property(tries = 300)
    void gridEqualsThePerPointPathWithinTheBound(
            @ForAll @LongRange(min = 1, max = 1_000_000) long seed,
            @ForAll boolean zeroFlux,
            @ForAll @IntRange(min = -1, max = 1) int sign,
            @ForAll @DoubleRange(min = -3, max = 8) double logPe,
            @ForAll @DoubleRange(min = -1, max = 1.7) double logWidth,
            @ForAll @DoubleRange(min = 1, max = 5) double r,
            @ForAll @DoubleRange(min = 0, max = 2) double mu,
            @ForAll @IntRange(min = 0, max = 3) int start,
            @ForAll boolean constant,
            @ForAll @IntRange(min = 0, max = 2) int methodIndex) {
        final Random rnd = new Random(seed);
        final double t = 0.5 + rnd.nextDouble();
        final double pe = pe(logPe, sign);
        final double lOverDx = Math.pow(10, logWidth);
        final TransportParameters p = WallGridSupport.params(pe, lOverDx, DX, t, r, mu);
        final int n = 50 + rnd.nextInt(250);
        final double xi0 = rnd.nextBoolean() ? 0.0 : rnd.nextInt(40) * 0.25 * DX;
        final PiecewiseLinearProfile prof = PiecewiseLinearProfile.uniform(xi0, DX,
            WallGridSupport.data(rnd, n, false), constant ? PiecewiseLinearProfile.Extension.CONSTANT
                : PiecewiseLinearProfile.Extension.ZERO);
        final double drift = pe * lOverDx * DX;
        final double x0;
        switch (start) {
            case 0:
                x0 = 0.0;
                break;
            case 1:
                x0 = rnd.nextInt(200) * 0.37 * DX;
                break;
            case 2:
                // the outputs about the drifted data (where the wall's image lands for v > 0)
                x0 = Math.max(0.0, drift - rnd.nextInt(100) * DX);
                break;
            default:
                x0 = rnd.nextDouble() * 1e-3 * DX;
        }
        final int nOut = 20 + rnd.nextInt(300);
        final Wall wall = zeroFlux ? Wall.ZERO_FLUX : Wall.ABSORBING;
        WallGridSupport.compare(p, wall, prof, x0, t, nOut, GridMethod.values()[methodIndex]);
    }

    @Property(tries = 150)
    void nonNegativeDataGiveNonNegativeValuesWithinTheBound(
            @ForAll @LongRange(min = 1, max = 1_000_000) long seed,
            @ForAll boolean zeroFlux,
            @ForAll @IntRange(min = -1, max = 1) int sign,
            @ForAll @DoubleRange(min = -3, max = 8) double logPe,
            @ForAll @DoubleRange(min = -1, max = 1.7) double logWidth,
            @ForAll @DoubleRange(min = 0, max = 1) double mu,
            @ForAll boolean constant) {
        final Random rnd = new Random(seed);
        final double t = 1.0;
        final TransportParameters p = WallGridSupport.params(pe(logPe, sign),
            Math.pow(10, logWidth), DX, t, 1.5, mu);
        final PiecewiseLinearProfile prof = PiecewiseLinearProfile.uniform(
            rnd.nextInt(10) * DX, DX, WallGridSupport.data(rnd, 200, true),
            constant ? PiecewiseLinearProfile.Extension.CONSTANT : PiecewiseLinearProfile.Extension.ZERO);
        final ProfileConvolution pc = ProfileConvolution.of(
            HalfLineKernel.of(p, zeroFlux ? Wall.ZERO_FLUX : Wall.ABSORBING), prof);
        final double[] out = new double[400];
        final double bound = pc.valuesOnGrid(0.0, t, out, GridMethod.AUTOMATIC);
        for (int i = 0; i < out.length; i++) {
            assertTrue(out[i] >= -bound, "i=" + i + " value " + out[i] + " bound " + bound);
        }
    }

    /**
     * Mass beside a zero-flux wall with μ = 0: the trapezoid rule over the grid with the
     * Euler–Maclaurin end correction −Δ²/12·(c′(X) − c′(0)), c′(0) = (v/D)·c(0) by the wall
     * condition and c′(X) = 0 far out, equals the initial mass. Data are smooth (a Gaussian
     * bump sampled finely), the kernel wide (L ≥ 20Δ) and the wall layer D/|v| ≥ 20Δ, so the
     * quadrature's next term, Δ⁴/720·c‴, is about (1/20)⁴/720 ≈ 1e-8 relative, below 1e-7.
     */
    @Property(tries = 60)
    void zeroFluxWallConservesMassOnTheGrid(
            @ForAll @LongRange(min = 1, max = 1_000_000) long seed,
            @ForAll @DoubleRange(min = -2.5, max = 2.5) double pe,
            @ForAll @DoubleRange(min = 20, max = 40) double lOverDx,
            @ForAll @DoubleRange(min = 1, max = 3) double r,
            @ForAll @IntRange(min = 0, max = 2) int methodIndex) {
        final Random rnd = new Random(seed);
        final double t = 1.0;
        final double l = lOverDx * DX;
        // the layer D/|v| = L/(4|P|) at least 20Δ
        final double peUsed = Math.copySign(Math.min(Math.abs(pe), lOverDx / 80), pe);
        final TransportParameters p = WallGridSupport.params(peUsed, lOverDx, DX, t, r, 0.0);
        final int n = 400;
        final double centre = (50 + rnd.nextInt(250)) * DX;
        final double spread = (5 + rnd.nextInt(30)) * DX;
        final double[] f = new double[n];
        double initial = 0;
        for (int j = 0; j < n; j++) {
            final double xi = j * DX;
            f[j] = Math.exp(-(xi - centre) * (xi - centre) / (spread * spread));
        }
        for (int j = 0; j + 1 < n; j++) {
            initial += 0.5 * DX * (f[j] + f[j + 1]);
        }
        final PiecewiseLinearProfile prof = PiecewiseLinearProfile.uniform(0.0, DX, f,
            PiecewiseLinearProfile.Extension.ZERO);
        final ProfileConvolution pc = ProfileConvolution.of(HalfLineKernel.of(p, Wall.ZERO_FLUX), prof);
        // far enough that c is negligible: data end + drift + 12 widths
        final double far = n * DX + Math.max(0, peUsed * l) + 12 * l;
        final int nOut = (int) Math.ceil(far / DX) + 1;
        final double[] c = new double[nOut];
        final double bound = pc.valuesOnGrid(0.0, t, c, GridMethod.values()[methodIndex]);
        double mass = 0.5 * (c[0] + c[nOut - 1]);
        for (int i = 1; i < nOut - 1; i++) {
            mass += c[i];
        }
        mass *= DX;
        final double slopeAtWall = p.velocity() / p.dispersion() * c[0];
        mass += DX * DX / 12 * slopeAtWall;
        assertEquals(initial, mass, 1e-7 * initial + nOut * DX * bound,
            "pe=" + peUsed + " L/dx=" + lOverDx);
    }
}
