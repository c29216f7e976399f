package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.function.DoubleUnaryOperator;
import org.advecta.quadrature.Estimate;
import org.advecta.solution.InitialGaussian;
import org.advecta.solution.InitialSlug;
import org.advecta.solution.InitialStep;
import org.advecta.testing.FixtureAudit;
import org.advecta.testing.ReferenceTable;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * Route 1 (φ as a function): the closed forms (Crank 1975, via org.advecta.solution) to
 * 1e-12 relative, the mpmath fixture within the returned estimate, and the estimate within
 * 100× of the actual error.
 */
class FunctionConvolutionTest {

    private static final String DIR = "fixtures/convolution/";


    private static FunctionConvolution fixtureFunction(String name, TransportParameters p) {
        switch (name) {
            case "sech":
                return FunctionConvolution.of(p, xi -> 1 / Math.cosh(xi));
            case "tent":
                return FunctionConvolution.of(p, xi -> Math.max(0, 1 - Math.abs(xi - 0.5) / 1.5))
                    .withSupport(-1, 2).withBreakpoints(-1, 0.5, 2);
            case "jump":
                return FunctionConvolution.of(p, xi -> Math.exp(-xi / 2))
                    .withSupport(0.25, Double.POSITIVE_INFINITY).withBreakpoints(0.25);
            default:
                throw new IllegalStateException(name);
        }
    }

    private static TransportParameters params(ReferenceTable.Row r) {
        return TransportParameters.of(r.getDouble("v"), r.getDouble("D"))
            .withRetardation(r.getDouble("R")).withDecay(r.getDouble("mu"));
    }

    @Test
    void fixtureIsAudited() {
        final ReferenceTable table = ReferenceTable.load(DIR + "function_convolution.csv");
        FixtureAudit.checkProvenance(table, "gen_convolution.py", DIR);
        assertTrue(table.rows().size() >= 100);
    }

    @Test
    void defaultToleranceMeetsTheFixtureWithinTheEstimate() {
        final ReferenceTable table = ReferenceTable.load(DIR + "function_convolution.csv");
        double worstRel = 0;
        for (ReferenceTable.Row r : table.rows()) {
            final Estimate e = fixtureFunction(r.get("function"), params(r))
                .value(r.getDouble("x"), r.getDouble("t"));
            final BigDecimal exact = r.value();
            final double err = Math.abs(new BigDecimal(e.value()).subtract(exact).doubleValue());
            assertTrue(err <= e.error() + Double.MIN_VALUE, () -> r.line() + " got " + e
                + " error " + err);
            final double ref = exact.doubleValue();
            if (ref != 0) {
                worstRel = Math.max(worstRel, err / Math.abs(ref));
            }
        }
        // the default tolerance is 1e-12 relative; the estimate above covers every row
        assertTrue(worstRel < 1e-11, "worst relative error " + worstRel);
    }

    @Test
    void estimateIsWithinAHundredTimesTheActualError() {
        final ReferenceTable table = ReferenceTable.load(DIR + "function_convolution.csv");
        int compared = 0;
        double worstRatio = 0;
        double bestRatio = Double.POSITIVE_INFINITY;
        for (double tol : new double[] {1e-5, 1e-8}) {
            for (ReferenceTable.Row r : table.rows()) {
                final Estimate e = fixtureFunction(r.get("function"), params(r))
                    .withTolerance(1e-300, tol).value(r.getDouble("x"), r.getDouble("t"));
                final BigDecimal exact = r.value();
                final double err = Math.abs(new BigDecimal(e.value()).subtract(exact,
                    MathContext.DECIMAL128).doubleValue());
                assertTrue(err <= e.error() + Double.MIN_VALUE, () -> r.line() + " tol " + tol
                    + " got " + e + " error " + err);
                // the ratio is meaningful only where the error is far above rounding
                if (err > 1e-13 * Math.abs(exact.doubleValue()) && err > 1e-300) {
                    compared++;
                    final double ratio = e.error() / err;
                    worstRatio = Math.max(worstRatio, ratio);
                    bestRatio = Math.min(bestRatio, ratio);
                    assertTrue(ratio <= 100, () -> r.line() + " estimate " + e.error()
                        + " vs error " + err);
                }
            }
        }
        System.out.printf("function fixture: %d rows with truncation error; estimate/error in "
            + "[%.3g, %.3g]%n", compared, bestRatio, worstRatio);
        assertTrue(compared >= 20, "too few rows exercise the estimate: " + compared);
    }

    /** The smooth (sech) rows through Gauss–Hermite, counting the calls of φ. */
    private static double[] smoothRun(double tol, boolean ratios) {
        final ReferenceTable table = ReferenceTable.load(DIR + "function_convolution.csv");
        int rows = 0;
        int compared = 0;
        int hermite = 0;
        long maxCalls = 0;
        long totalCalls = 0;
        double worstRatio = 0;
        double bestRatio = Double.POSITIVE_INFINITY;
        double worstRel = 0;
        for (ReferenceTable.Row r : table.rows()) {
            if (!r.get("function").equals("sech")) {
                continue;
            }
            rows++;
            final long[] calls = {0};
            FunctionConvolution f = FunctionConvolution.of(params(r), xi -> {
                calls[0]++;
                return 1 / Math.cosh(xi);
            }).withSmoothData();
            if (tol > 0) {
                f = f.withTolerance(1e-300, tol);
            }
            final Estimate e = f.value(r.getDouble("x"), r.getDouble("t"));
            final BigDecimal exact = r.value();
            final double err = Math.abs(new BigDecimal(e.value()).subtract(exact,
                MathContext.DECIMAL128).doubleValue());
            assertTrue(err <= e.error() + Double.MIN_VALUE, () -> r.line() + " tol " + tol
                + " got " + e + " error " + err);
            worstRel = Math.max(worstRel, err / Math.abs(exact.doubleValue()));
            // at most 310 calls: Gauss–Hermite met the tolerance (no adaptive fallback)
            if (calls[0] <= 310) {
                hermite++;
            }
            maxCalls = Math.max(maxCalls, calls[0]);
            totalCalls += calls[0];
            if (ratios && err > 1e-13 * Math.abs(exact.doubleValue()) && err > 1e-300) {
                compared++;
                final double ratio = e.error() / err;
                worstRatio = Math.max(worstRatio, ratio);
                bestRatio = Math.min(bestRatio, ratio);
                assertTrue(ratio <= 100, () -> r.line() + " estimate " + e.error()
                    + " vs error " + err);
            }
        }
        System.out.printf("Gauss-Hermite, tolerance %s: %d sech rows, %d by Gauss-Hermite, "
            + "phi calls mean %.1f max %d; worst relative error %.3g; %d rows with truncation "
            + "error, estimate/error in [%.3g, %.3g]%n", tol > 0 ? tol : "default", rows, hermite,
            (double) totalCalls / rows, maxCalls, worstRel, compared, bestRatio, worstRatio);
        return new double[] {rows, hermite, compared, worstRel};
    }

    @Test
    void smoothDataByGaussHermiteMeetTheFixtureWithinTheEstimate() {
        final double[] run = smoothRun(0, false);
        assertTrue(run[0] >= 30, "sech rows: " + run[0]);
        // the default tolerance is 1e-12 relative
        assertTrue(run[3] < 1e-11, "worst relative error " + run[3]);
        // Gauss–Hermite (not the fallback) serves most smooth rows
        assertTrue(run[1] >= 0.75 * run[0], "rows by Gauss-Hermite: " + run[1]);
    }

    @Test
    void smoothDataEstimateIsWithinAHundredTimesTheActualError() {
        int compared = 0;
        for (double tol : new double[] {1e-4, 1e-6, 1e-9}) {
            compared += (int) smoothRun(tol, true)[2];
        }
        assertTrue(compared >= 20, "too few rows exercise the estimate: " + compared);
    }

    @Test
    void smoothDataAgreeWithTheAdaptivePathAndTheGaussianClosedForm() {
        final TransportParameters p = TransportParameters.of(-3.0, 2.0).withRetardation(2.5)
            .withDecay(0.3);
        final double s0 = 0.75;
        final DoubleUnaryOperator gauss = xi -> 2.0 * Math.exp(-(xi - 0.5) * (xi - 0.5)
            / (2 * s0 * s0)) / (s0 * Math.sqrt(2 * Math.PI));
        final FunctionConvolution g = FunctionConvolution.of(p, gauss).withSmoothData();
        final InitialGaussian ge = InitialGaussian.of(p, 0.5, s0, 2.0);
        for (double t : new double[] {0.01, 0.4, 3.0}) {
            final double drift = p.velocity() * t / p.retardation();
            for (int i = -8; i <= 8; i++) {
                final double x = drift + 0.5 + 0.25 * i;
                assertClose(ge.value(x, t), g.value(x, t));
            }
        }
        // far in the tail (value ≈ 1e-43 of the peak)
        assertClose(ge.value(10, 0.4), g.value(10, 0.4));
        // data far narrower than the kernel: the rules cannot meet the tolerance, the
        // adaptive path takes over (more than 310 calls) and agrees with the plain route
        final long[] calls = {0};
        final DoubleUnaryOperator narrow = xi -> 1 / Math.cosh(xi / 0.02);
        final FunctionConvolution counted = FunctionConvolution.of(p, xi -> {
            calls[0]++;
            return narrow.applyAsDouble(xi);
        }).withSmoothData();
        final Estimate viaFallback = counted.value(-0.3, 0.4);
        final Estimate plain = FunctionConvolution.of(p, narrow).value(-0.3, 0.4);
        assertTrue(calls[0] > 310, "calls " + calls[0]);
        assertEquals(plain.value(), viaFallback.value(), 0.0);
        assertTrue(plain.error() < 1e-12 * plain.value(), "estimate " + plain);
    }

    @Test
    void smoothDataDeclarationIsValidated() {
        final TransportParameters p = TransportParameters.of(1, 1);
        final FunctionConvolution f = FunctionConvolution.of(p, Math::cos);
        assertTrue(f.withSmoothData().smoothData());
        assertTrue(!f.smoothData());
        assertThrows(IllegalArgumentException.class, () -> f.withSupport(0, 1).withSmoothData());
        assertThrows(IllegalArgumentException.class, () -> f.withBreakpoints(0).withSmoothData());
        assertThrows(IllegalArgumentException.class, () -> f.withSmoothData().withSupport(0, 1));
        assertThrows(IllegalArgumentException.class, () -> f.withSmoothData().withBreakpoints(0));
        // Gauss–Hermite is for the infinite line: the half-line kernels take the adaptive path
        assertThrows(IllegalArgumentException.class, () -> FunctionConvolution.of(
            HalfLineKernel.of(p, org.advecta.halfspace.Wall.ZERO_FLUX), Math::cos)
            .withSmoothData());
        final FunctionConvolution nan = FunctionConvolution.of(p, xi -> xi > 0.3 ? Double.NaN
            : 1).withSmoothData();
        assertThrows(IllegalArgumentException.class, () -> nan.value(0, 1));
    }

    @Test
    void gaussianStepAndBoxAsFunctionsMatchTheClosedForms() {
        final TransportParameters[] ps = {
            TransportParameters.of(1.0, 0.1),
            TransportParameters.of(-3.0, 2.0).withRetardation(2.5).withDecay(0.3),
            TransportParameters.of(0.0, 1e-3).withDecay(1.0),
        };
        for (TransportParameters p : ps) {
            final double s0 = 0.75;
            final DoubleUnaryOperator gauss = xi -> 2.0 * Math.exp(-(xi - 0.5) * (xi - 0.5)
                / (2 * s0 * s0)) / (s0 * Math.sqrt(2 * Math.PI));
            final FunctionConvolution g = FunctionConvolution.of(p, gauss);
            final FunctionConvolution box = FunctionConvolution.of(p, xi -> 2.0)
                .withSupport(-0.5, 1.25);
            final FunctionConvolution step = FunctionConvolution.of(p, xi -> 3.0)
                .withSupport(Double.NEGATIVE_INFINITY, 0.75);
            final InitialGaussian ge = InitialGaussian.of(p, 0.5, s0, 2.0);
            final InitialSlug be = InitialSlug.of(p, -0.5, 1.25, 2.0);
            final InitialStep se = InitialStep.of(p, 0.75, 3.0, InitialStep.Side.LEFT);
            for (double t : new double[] {0.01, 0.4, 3.0}) {
                final double drift = p.velocity() * t / p.retardation();
                for (int i = -12; i <= 12; i++) {
                    final double x = drift + 0.5 + 0.25 * i;
                    assertClose(ge.value(x, t), g.value(x, t));
                    assertClose(be.value(x, t), box.value(x, t));
                    assertClose(se.value(x, t), step.value(x, t));
                }
            }
        }
    }

    private static void assertClose(double expected, Estimate actual) {
        final double err = Math.abs(actual.value() - expected);
        assertTrue(err <= 1e-12 * Math.abs(expected) + 1e-300, () -> expected + " vs " + actual);
        // (the estimate is checked against the mpmath fixture: here the closed forms' own
        // rounding, up to κ·2⁻⁵³ with κ ≈ 100 at the far points, is of its size)
    }

    @Test
    void kronrodRulePinned() {
        // K15 integrates x^k exactly for k ≤ 22 on [−1, 1], G7 for k ≤ 13 (Gauss–Kronrod
        // degrees 3n + 1 and 2n − 1 with n = 7); both fail at the next even degree
        for (int k = 0; k <= 24; k += 2) {
            double kr = AdaptiveKronrod.WGK[7] * (k == 0 ? 1 : 0);
            double ga = AdaptiveKronrod.WG[3] * (k == 0 ? 1 : 0);
            for (int j = 0; j < 7; j++) {
                final double p = 2 * Math.pow(AdaptiveKronrod.XGK[j], k);
                kr += AdaptiveKronrod.WGK[j] * p;
                if ((j & 1) == 1) {
                    ga += AdaptiveKronrod.WG[j >> 1] * p;
                }
            }
            final double exact = 2.0 / (k + 1);
            if (k <= 22) {
                assertEquals(exact, kr, 4e-16, "K15 degree " + k);
            } else {
                assertTrue(Math.abs(kr - exact) > 1e-12, "K15 is not exact at degree " + k);
            }
            if (k <= 12) {
                assertEquals(exact, ga, 4e-16, "G7 degree " + k);
            } else if (k == 14) {
                assertTrue(Math.abs(ga - exact) > 1e-6, "G7 is not exact at degree 14");
            }
        }
    }

    @Test
    void collapsedKernelReturnsTheData() {
        final FunctionConvolution f = FunctionConvolution.of(TransportParameters.of(2.0, 1.0)
            .withDecay(0.5), Math::sin);
        final Estimate e = f.value(1.0, 0.0);
        assertEquals(Math.sin(1.0), e.value(), 0.0);
        assertEquals(0.0, e.error(), 0.0);
    }

    @Test
    void badInputIsRejected() {
        final FunctionConvolution f = FunctionConvolution.of(TransportParameters.of(1, 1),
            xi -> xi > 0 ? Double.NaN : 1);
        assertThrows(IllegalArgumentException.class, () -> f.value(0.5, 1));
        final FunctionConvolution g = FunctionConvolution.of(TransportParameters.of(1, 1),
            xi -> 1);
        assertThrows(IllegalArgumentException.class, () -> g.value(Double.NaN, 1));
        assertThrows(IllegalArgumentException.class, () -> g.value(0, -1));
        assertThrows(IllegalArgumentException.class, () -> g.withSupport(1, 1));
        assertThrows(IllegalArgumentException.class, () -> g.withSupport(Double.NaN, 1));
        assertThrows(IllegalArgumentException.class, () -> g.withTolerance(0, 1e-10));
        assertThrows(IllegalArgumentException.class, () -> g.withTolerance(1e-10, 1e-17));
        assertThrows(IllegalArgumentException.class, () -> g.withBreakpoints(Double.NaN));
        final double[] x = {0, 1};
        assertThrows(IllegalArgumentException.class, () -> g.values(x, 1, x, x));
    }
}
