package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.advecta.halfspace.Wall;
import org.advecta.quadrature.Estimate;
import org.advecta.testing.FixtureAudit;
import org.advecta.testing.ReferenceTable;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * Data near a wall: routes 2 (samples, {@link ProfileConvolution}) and 1 (a function,
 * {@link FunctionConvolution}) with the half-line kernels against the mpmath fixtures
 * wall_absorbing.csv and wall_zeroflux.csv (50/60-digit quadrature of the data against the
 * half-space Green's function, whose wall condition, PDE residual and mass the generator
 * checks).
 */
class HalfLineConvolutionTest {

    private static final String DIR = "fixtures/convolution/";
    private static final String[] FILES = {"wall_absorbing.csv", "wall_zeroflux.csv"};
    private static final double U = 0x1.0p-53;

    private static TransportParameters params(ReferenceTable.Row r) {
        return TransportParameters.of(r.getDouble("v"), r.getDouble("D"))
            .withRetardation(r.getDouble("R")).withDecay(r.getDouble("mu"));
    }

    private static ConvolutionKernel kernel(ReferenceTable.Row r) {
        return r.get("wall").equals("absorbing") ? HalfLineKernel.of(params(r), Wall.ABSORBING)
            : HalfLineKernel.of(params(r), Wall.ZERO_FLUX);
    }

    private static PiecewiseLinearProfile profile(String name) {
        switch (name) {
            case "wall_kinks":
                return PiecewiseLinearProfile.of(new double[] {0.0, 0.25, 0.5, 0.5, 1.5, 2.0},
                    new double[] {1.0, 2.0, 0.5, 1.5, 0.25, 0.0}, PiecewiseLinearProfile.Extension.ZERO);
            case "wall_level":
                return PiecewiseLinearProfile.of(new double[] {0.0, 0.5, 1.0},
                    new double[] {0.5, 1.0, 0.75}, PiecewiseLinearProfile.Extension.CONSTANT);
            default:
                throw new IllegalStateException(name);
        }
    }

    private static FunctionConvolution bump(ReferenceTable.Row r) {
        return FunctionConvolution.of(kernel(r), xi -> xi * Math.exp(-xi));
    }

    @Test
    void fixturesAreAudited() {
        for (String file : FILES) {
            final ReferenceTable table = ReferenceTable.load(DIR + file);
            FixtureAudit.checkProvenance(table, "gen_convolution.py", DIR);
            assertTrue(table.rows().size() >= 90, file);
        }
    }

    /**
     * Samples: within 1e-12 of the scale Σ|terms| (the free part of |data| plus |value|: the
     * wall terms cancel against the free part near the wall) plus the positions' rounding
     * 64κ·2⁻⁵³ of it, κ = (|x| + |vt/R| + 2)/L.
     */
    @Test
    void samplesNearAWallMatchTheFixtures() {
        double worst = 0;
        double worstRel = 0;
        int n = 0;
        for (String file : FILES) {
            for (ReferenceTable.Row r : ReferenceTable.load(DIR + file).rows()) {
                if (r.get("data").equals("wall_bump")) {
                    continue;
                }
                final PiecewiseLinearProfile f = profile(r.get("data"));
                final double x = r.getDouble("x");
                final double t = r.getDouble("t");
                final double c = ProfileConvolution.of(kernel(r), f).value(x, t);
                final BigDecimal exact = r.value();
                final double err = Math.abs(new BigDecimal(c).subtract(exact,
                    MathContext.DECIMAL128).doubleValue());
                final double scale = ProfileConvolution.of(params(r), f).value(x, t)
                    + Math.abs(exact.doubleValue());
                final TransportParameters p = params(r);
                final double l = Math.sqrt(4 * p.dispersion() * t / p.retardation());
                final double kappa = (Math.abs(x) + Math.abs(p.velocity() * t / p.retardation())
                    + 2) / l;
                final double tol = (1e-12 + 64 * kappa * U) * scale;
                worst = Math.max(worst, err / tol);
                if (exact.signum() != 0) {
                    worstRel = Math.max(worstRel, err / Math.abs(exact.doubleValue()));
                }
                n++;
                assertTrue(err <= tol, () -> r.line() + ": got " + c + " error " + err
                    + " tolerance " + tol);
            }
        }
        System.out.printf("wall fixtures, samples: %d rows, worst error %.3g of the tolerance, "
            + "worst relative error %.3g%n", n, worst, worstRel);
        assertTrue(n >= 120, "rows " + n);
    }

    @Test
    void functionNearAWallIsWithinItsEstimate() {
        int n = 0;
        double worstRel = 0;
        for (String file : FILES) {
            for (ReferenceTable.Row r : ReferenceTable.load(DIR + file).rows()) {
                if (!r.get("data").equals("wall_bump")) {
                    continue;
                }
                final Estimate e = bump(r).value(r.getDouble("x"), r.getDouble("t"));
                final BigDecimal exact = r.value();
                final double err = Math.abs(new BigDecimal(e.value()).subtract(exact,
                    MathContext.DECIMAL128).doubleValue());
                assertTrue(err <= e.error() + Double.MIN_VALUE, () -> r.line() + " got " + e
                    + " error " + err);
                if (exact.signum() != 0) {
                    worstRel = Math.max(worstRel, err / Math.abs(exact.doubleValue()));
                }
                n++;
            }
        }
        System.out.printf("wall fixtures, function: %d rows, worst relative error %.3g%n", n,
            worstRel);
        assertTrue(n >= 60, "rows " + n);
    }

    @Test
    void functionEstimateNearAWallIsWithinAHundredTimesTheError() {
        int compared = 0;
        double best = Double.POSITIVE_INFINITY;
        double worst = 0;
        for (double tol : new double[] {1e-5, 1e-8}) {
            for (String file : FILES) {
                for (ReferenceTable.Row r : ReferenceTable.load(DIR + file).rows()) {
                    if (!r.get("data").equals("wall_bump")) {
                        continue;
                    }
                    final Estimate e = bump(r).withTolerance(1e-300, tol)
                        .value(r.getDouble("x"), r.getDouble("t"));
                    final BigDecimal exact = r.value();
                    final double err = Math.abs(new BigDecimal(e.value()).subtract(exact,
                        MathContext.DECIMAL128).doubleValue());
                    assertTrue(err <= e.error() + Double.MIN_VALUE, () -> r.line() + " tol "
                        + tol + " got " + e + " error " + err);
                    if (err > 1e-13 * Math.abs(exact.doubleValue()) && err > 1e-300) {
                        compared++;
                        final double ratio = e.error() / err;
                        best = Math.min(best, ratio);
                        worst = Math.max(worst, ratio);
                        assertTrue(ratio <= 100, () -> r.line() + " estimate " + e.error()
                            + " vs error " + err);
                    }
                }
            }
        }
        System.out.printf("wall fixtures, function at tolerances 1e-5, 1e-8: %d rows with "
            + "truncation error, estimate/error in [%.3g, %.3g]%n", compared, best, worst);
        assertTrue(compared >= 20, "too few rows exercise the estimate: " + compared);
    }
}
