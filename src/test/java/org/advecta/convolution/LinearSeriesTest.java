package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InletInput;
import org.advecta.solution.InletRamp;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.testing.FixtureAudit;
import org.advecta.testing.ReferenceTable;
import org.advecta.testing.ReferenceTable.Row;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * A piecewise-linear inlet series (ramp up, plateau, ramp down, held) against the mpmath
 * Duhamel quadrature of linear_inlet.csv (gen_ramp.py), and its piecewise-constant limit.
 */
class LinearSeriesTest {

    private static final String DIR = "fixtures/solution/";
    private static final double[] TIMES = {0.0, 1.0, 2.5, 4.0, 5.0};
    private static final double[] LEVELS = {0.25, 2.0, 2.0, 0.5, 0.5};

    private static TransportParameters params(Row r) {
        return TransportParameters.of(r.getDouble("v"), r.getDouble("D"))
            .withRetardation(r.getDouble("R")).withDecay(r.getDouble("mu"));
    }

    /**
     * The scale of the absolute error bound: |g₀|·U + Σ|sₖ − sₖ₋₁|·W(x, t − tₖ), the sum of
     * the magnitudes of the superposed terms.
     */
    private static double termScale(TransportParameters p, InletCondition c, double x,
                                    double t) {
        final Solution1D u = c == InletCondition.FIRST_TYPE
            ? FirstTypeInlet.of(p, InletInput.constant(1.0))
            : ThirdTypeInlet.of(p, InletInput.constant(1.0));
        final InletRamp w = c == InletCondition.FIRST_TYPE ? InletRamp.firstType(p)
            : InletRamp.thirdType(p);
        double scale = Math.abs(LEVELS[0]) * u.value(x, t);
        double before = 0;
        for (int k = 0; k < TIMES.length && TIMES[k] < t; k++) {
            final double slope = k + 1 < TIMES.length
                ? (LEVELS[k + 1] - LEVELS[k]) / (TIMES[k + 1] - TIMES[k]) : 0.0;
            scale += Math.abs(slope - before) * w.value(x, t - TIMES[k]);
            before = slope;
        }
        return scale;
    }

    private static double maxSquaredA(TransportParameters p, double x, double t) {
        final double u = Math.sqrt(p.velocity() * p.velocity()
            + 4 * p.decayRate() * p.dispersion());
        double max = 0;
        for (int k = 0; k < TIMES.length && TIMES[k] < t; k++) {
            final double tau = t - TIMES[k];
            final double a = (x - u * tau / p.retardation())
                / Math.sqrt(4 * p.dispersion() * tau / p.retardation());
            if (a > 0) {
                max = Math.max(max, a * a);
            }
        }
        return max;
    }

    @Test
    void seriesMatchesTheDuhamelQuadrature() {
        final ReferenceTable table = ReferenceTable.load(DIR + "linear_inlet.csv");
        FixtureAudit.checkProvenance(table, "gen_ramp.py", DIR);
        int rows = 0;
        double worst = 0;
        for (Row r : table.rows()) {
            final TransportParameters p = params(r);
            final InletCondition c = r.get("inlet").equals("third") ? InletCondition.THIRD_TYPE
                : InletCondition.FIRST_TYPE;
            final double x = r.getDouble("x");
            final double t = r.getDouble("t");
            final double e = TabulatedInlet.linear(p, c, TIMES, LEVELS).value(x, t);
            final double err = Math.abs(new BigDecimal(e).subtract(r.value(),
                MathContext.DECIMAL128).doubleValue());
            // the documented bound: (n + 16 + 2κ)·2⁻⁵³ times the term scale; κ (not tabulated here) is
            // estimated as 2(1 + A²), A = (x − uτ/R)/√(4Dτ/R) the largest over the terms'
            // τ = t − tₖ: the exp(−A²) of each term dominates its condition number
            final double scale = termScale(p, c, x, t);
            final double kappa = 2 * (1 + maxSquaredA(p, x, t));
            final double allowed = (TIMES.length + 16 + 2 * kappa) * 0x1.0p-53 * scale;
            if (err > 0) {
                worst = Math.max(worst, err / allowed);
            }
            assertTrue(err <= allowed, r.line() + " got " + e + " error " + err
                + " allowed " + allowed);
            rows++;
        }
        System.out.printf("linear series fixture: %d rows, worst error/bound %.3g%n", rows,
            worst);
        assertTrue(rows >= 60, "rows: " + rows);
    }

    @Test
    void refinedSeriesApproachesItsPiecewiseConstantLimit() {
        // g(t) = 1 + sin(t) sampled every Δt: the linear and the constant (left-end) series
        // differ in input by at most Δt·max|g′| = Δt; for the first type 0 ≤ U and the
        // solution operator preserves order, so the outputs differ by at most Δt (maximum
        // principle, common practice), and the difference must shrink with Δt.
        final TransportParameters p = TransportParameters.of(1.0, 0.1).withRetardation(2.0)
            .withDecay(0.05);
        double previous = Double.POSITIVE_INFINITY;
        for (int n : new int[] {20, 80, 320}) {
            final double dt = 4.0 / n;
            final double[] times = new double[n + 1];
            final double[] levels = new double[n + 1];
            for (int k = 0; k <= n; k++) {
                times[k] = k * dt;
                levels[k] = 1 + Math.sin(times[k]);
            }
            final TabulatedInlet lin = TabulatedInlet.linear(p, InletCondition.FIRST_TYPE,
                times, levels);
            final TabulatedInlet con = TabulatedInlet.of(p, InletCondition.FIRST_TYPE, times,
                levels);
            double max = 0;
            for (double x : new double[] {0.1, 0.5, 1.5}) {
                for (double t : new double[] {0.7, 2.2, 3.9}) {
                    final double d = Math.abs(lin.value(x, t) - con.value(x, t));
                    assertTrue(d <= dt, "n=" + n + " x=" + x + " t=" + t + " d=" + d);
                    max = Math.max(max, d);
                }
            }
            assertTrue(max < 0.5 * previous, "n=" + n + " max " + max + " previous " + previous);
            previous = max;
        }
    }

    @Test
    void twoPointSeriesIsTheScaledRamp() {
        // g from 0 to s·t₁ linearly, then held: s·(W(t) − W(t − t₁)); before t₁ exactly s·W
        final TransportParameters p = TransportParameters.of(0.7, 0.05).withRetardation(1.5);
        for (InletCondition c : InletCondition.values()) {
            final TabulatedInlet series = TabulatedInlet.linear(p, c, new double[] {0, 2},
                new double[] {0, 3});
            final InletRamp w = c == InletCondition.FIRST_TYPE ? InletRamp.firstType(p)
                : InletRamp.thirdType(p);
            for (double x : new double[] {0.05, 0.5, 2.0}) {
                final double t = 1.3;
                assertEquals(1.5 * w.value(x, t), series.value(x, t),
                    2 * Math.ulp(1.5 * w.value(x, t)), c + " x=" + x);
            }
        }
    }
}
