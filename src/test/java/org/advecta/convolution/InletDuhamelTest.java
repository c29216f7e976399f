package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.advecta.quadrature.Estimate;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.testing.FixtureAudit;
import org.advecta.testing.ReferenceTable;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * Time-varying inlets (Duhamel): the tabulated series against the library's closed forms
 * (Ogata–Banks, Lindstrom et al., van Genuchten–Alves, checked against mpmath in
 * org.advecta.solution) and against the mpmath Duhamel quadrature fixture; the function
 * input within its estimate.
 */
class InletDuhamelTest {

    private static final String DIR = "fixtures/convolution/";
    private static final double[] TABLE_TIMES = {0.0, 0.25, 0.5, 1.0, 1.5, 2.0, 3.0};
    private static final TransportParameters[] PS = {
        TransportParameters.of(1.0, 0.1),
        TransportParameters.of(0.5, 0.2).withRetardation(2.0).withDecay(0.05),
        TransportParameters.of(3.0, 0.01).withRetardation(1.5).withDecay(0.5),
    };

    @Test
    void constantTableIsOgataBanks() {
        for (TransportParameters p : PS) {
            final Solution1D table = TabulatedInlet.of(p, InletCondition.FIRST_TYPE,
                new double[] {0.0}, new double[] {2.5});
            final Solution1D table3 = TabulatedInlet.of(p, InletCondition.THIRD_TYPE,
                new double[] {0.0}, new double[] {2.5});
            final Solution1D closed = FirstTypeInlet.of(p, InletInput.constant(2.5));
            final Solution1D closed3 = ThirdTypeInlet.of(p, InletInput.constant(2.5));
            for (double t : new double[] {0.0, 0.01, 0.7, 4.0}) {
                for (double x : new double[] {0.0, 0.05, 0.5, 2.0, 6.0}) {
                    // one term: 2.5·U is within one rounding of the closed form's C₀·U
                    assertEquals(closed.value(x, t), table.value(x, t),
                        2 * Math.ulp(closed.value(x, t)), "x=" + x + " t=" + t);
                    assertEquals(closed3.value(x, t), table3.value(x, t),
                        2 * Math.ulp(closed3.value(x, t)), "x=" + x + " t=" + t);
                }
            }
        }
    }

    @Test
    void twoLevelTableIsThePulse() {
        for (TransportParameters p : PS) {
            final Solution1D table = TabulatedInlet.of(p, InletCondition.FIRST_TYPE,
                new double[] {0.0, 0.8}, new double[] {1.5, 0.0});
            final Solution1D pulse = FirstTypeInlet.of(p, InletInput.pulse(1.5, 0.8));
            for (double t : new double[] {0.3, 0.8, 1.1, 4.0}) {
                for (double x : new double[] {0.05, 0.5, 2.0}) {
                    final double e = pulse.value(x, t);
                    // the difference of two step responses against the library's pulse form
                    // (which avoids the late-time cancellation): 1e-13 of the step size
                    assertEquals(e, table.value(x, t), 1e-13 * 1.5, "x=" + x + " t=" + t);
                }
            }
        }
    }

    @Test
    void tableAndFunctionMatchTheDuhamelQuadratureFixture() {
        final ReferenceTable table = ReferenceTable.load(DIR + "variable_inlet.csv");
        FixtureAudit.checkProvenance(table, "gen_convolution.py", DIR);
        int tables = 0;
        int linears = 0;
        double worstLinear = 0;
        int functions = 0;
        double worstTable = 0;
        double worstRatio = 0;
        for (ReferenceTable.Row r : table.rows()) {
            final TransportParameters p = TransportParameters.of(r.getDouble("v"), r.getDouble("D"))
                .withRetardation(r.getDouble("R")).withDecay(r.getDouble("mu"));
            final double lambda = r.getDouble("lambda");
            final double x = r.getDouble("x");
            final double t = r.getDouble("t");
            final BigDecimal exact = r.value();
            if (r.get("input").equals("table")) {
                final double[] levels = new double[TABLE_TIMES.length];
                for (int k = 0; k < levels.length; k++) {
                    levels[k] = Math.exp(-lambda * TABLE_TIMES[k]);
                }
                final double v = TabulatedInlet.of(p, InletCondition.FIRST_TYPE, TABLE_TIMES, levels)
                    .value(x, t);
                // the levels are rounded exp values (1 ulp) and each step response is within
                // its contract: 1e-14 relative covers both at these well-conditioned points
                final double err = Math.abs(new BigDecimal(v).subtract(exact,
                    MathContext.DECIMAL128).doubleValue());
                worstTable = Math.max(worstTable, err / exact.doubleValue());
                assertTrue(err <= 1e-14 * exact.doubleValue(), r.line() + " got " + v);
                tables++;
            } else if (r.get("input").equals("linear")) {
                final double[] levels = new double[TABLE_TIMES.length];
                for (int k = 0; k < levels.length; k++) {
                    levels[k] = Math.exp(-lambda * TABLE_TIMES[k]);
                }
                final double e = TabulatedInlet.linear(p, InletCondition.FIRST_TYPE, TABLE_TIMES,
                    levels).value(x, t);
                final double err = Math.abs(new BigDecimal(e).subtract(exact,
                    MathContext.DECIMAL128).doubleValue());
                worstLinear = Math.max(worstLinear, err / exact.doubleValue());
                // the levels' and closed forms' rounding (1e-14 relative)
                assertTrue(err <= 1e-14 * exact.doubleValue(), r.line() + " got " + e);
                linears++;
            } else {
                for (double tol : new double[] {1e-12, 1e-6}) {
                    final Estimate e = FunctionInlet.of(p, InletCondition.FIRST_TYPE,
                        s -> Math.exp(-lambda * s)).withTolerance(1e-300, tol).value(x, t);
                    final double err = Math.abs(new BigDecimal(e.value()).subtract(exact,
                        MathContext.DECIMAL128).doubleValue());
                    assertTrue(err <= e.error(), r.line() + " tol " + tol + " got " + e
                        + " error " + err);
                    if (err > 1e-13 * exact.doubleValue()) {
                        worstRatio = Math.max(worstRatio, e.error() / err);
                        assertTrue(e.error() <= 100 * err, r.line() + " got " + e + " error " + err);
                    }
                }
                functions++;
            }
        }
        System.out.printf("inlet fixture: %d table rows (worst relative error %.3g), %d linear"
            + " rows (worst %.3g), %d function rows (worst estimate/error %.3g)%n", tables,
            worstTable, linears, worstLinear, functions, worstRatio);
        assertTrue(tables >= 20 && linears >= 20 && functions >= 20);
    }

    @Test
    void impulseResponsesIntegrateToTheStepResponses() {
        // ∫₀ᵗ K dτ = U(x, t): checks the impulse responses (the third type's recalled from
        // memory) against the library's closed forms
        for (TransportParameters p : PS) {
            for (InletCondition c : InletCondition.values()) {
                final FunctionInlet f = FunctionInlet.of(p, c, s -> 1.0);
                final Solution1D closed = c == InletCondition.FIRST_TYPE
                    ? FirstTypeInlet.of(p, InletInput.constant(1.0))
                    : ThirdTypeInlet.of(p, InletInput.constant(1.0));
                for (double t : new double[] {0.2, 1.0, 5.0}) {
                    for (double x : new double[] {0.05, 0.5, 2.0}) {
                        final Estimate e = f.value(x, t);
                        final double u = closed.value(x, t);
                        assertEquals(u, e.value(), e.error() + 1e-14 * u + 1e-300,
                            c + " x=" + x + " t=" + t + " " + p);
                    }
                }
            }
        }
    }

    @Test
    void exponentialFunctionInputMatchesTheClosedForm() {
        for (TransportParameters p : PS) {
            for (InletCondition c : InletCondition.values()) {
                final Solution1D closed = c == InletCondition.FIRST_TYPE
                    ? FirstTypeInlet.of(p, InletInput.exponential(2.0, 0.15))
                    : ThirdTypeInlet.of(p, InletInput.exponential(2.0, 0.15));
                final FunctionInlet f = FunctionInlet.of(p, c, s -> 2.0 * Math.exp(-0.15 * s));
                for (double t : new double[] {0.3, 2.0, 6.0}) {
                    for (double x : new double[] {0.05, 1.0, 3.0}) {
                        final double u = closed.value(x, t);
                        final Estimate e = f.value(x, t);
                        assertEquals(u, e.value(), e.error() + 1e-14 * Math.abs(u) + 1e-300,
                            c + " x=" + x + " t=" + t);
                    }
                }
            }
        }
    }

    @Test
    void linearSeriesMatchesTheImpulseResponseQuadrature() {
        // two independent quadratures: the time integral of the unit (step) response per kink
        // against Duhamel's integral of the interpolated input times the impulse response
        final double[] times = {0.0, 0.4, 1.0, 1.8, 3.0};
        final double[] levels = {0.5, 2.0, 1.2, 1.5, 0.25};
        for (TransportParameters p : PS) {
            for (InletCondition c : InletCondition.values()) {
                final TabulatedInlet series = TabulatedInlet.linear(p, c, times, levels);
                final FunctionInlet f = FunctionInlet.of(p, c, s -> interpolate(times, levels, s))
                    .withBreakpoints(times).withTolerance(1e-300, 1e-13);
                for (double t : new double[] {0.3, 1.1, 2.5, 5.0}) {
                    for (double x : new double[] {0.05, 0.6, 2.0}) {
                        final double a = series.value(x, t);
                        final Estimate b = f.value(x, t);
                        assertEquals(b.value(), a, b.error() + 1e-14 * Math.abs(b.value())
                            + 1e-300, c + " x=" + x + " t=" + t);
                    }
                }
            }
        }
    }

    private static double interpolate(double[] times, double[] levels, double s) {
        for (int k = 0; k + 1 < times.length; k++) {
            if (s <= times[k + 1]) {
                final double w = (s - times[k]) / (times[k + 1] - times[k]);
                return levels[k] * (1 - w) + levels[k + 1] * w;
            }
        }
        return levels[levels.length - 1];
    }

    @Test
    void linearSeriesOfAnExponentialConvergesToItsClosedForm() {
        // first type: 0 ≤ U ≤ 1 and the solution operator preserves order, so
        // |c_PL − c_exp| ≤ sup|g_PL − g_exp| ≤ Δt²·λ²·C₀/8 (the interpolation error;
        // maximum principle, common practice)
        final double lambda = 0.15;
        final double dt = 0.05;
        final int n = 161;
        final double[] times = new double[n];
        final double[] levels = new double[n];
        for (int k = 0; k < n; k++) {
            times[k] = k * dt;
            levels[k] = 2.0 * Math.exp(-lambda * times[k]);
        }
        for (TransportParameters p : PS) {
            final TabulatedInlet series = TabulatedInlet.linear(p, InletCondition.FIRST_TYPE,
                times, levels);
            final Solution1D closed = FirstTypeInlet.of(p, InletInput.exponential(2.0, lambda));
            for (double t : new double[] {0.5, 2.0, 7.5}) {
                for (double x : new double[] {0.05, 0.6, 2.0}) {
                    assertEquals(closed.value(x, t), series.value(x, t),
                        dt * dt * lambda * lambda * 2.0 / 8 + 1e-13, "x=" + x + " t=" + t);
                }
            }
        }
    }

    @Test
    void badInputIsRejected() {
        final TransportParameters p = TransportParameters.of(1, 1);
        assertThrows(IllegalArgumentException.class, () -> TabulatedInlet.of(p,
            InletCondition.FIRST_TYPE, new double[] {0.5}, new double[] {1}));
        assertThrows(IllegalArgumentException.class, () -> TabulatedInlet.of(p,
            InletCondition.FIRST_TYPE, new double[] {0, 1, 1}, new double[] {1, 2, 3}));
        assertThrows(IllegalArgumentException.class, () -> TabulatedInlet.of(p,
            InletCondition.FIRST_TYPE, new double[] {0, 1}, new double[] {1, Double.NaN}));
        assertThrows(IllegalArgumentException.class, () -> TabulatedInlet.of(p,
            InletCondition.FIRST_TYPE, new double[] {0, 1}, new double[] {1}));
        assertThrows(IllegalArgumentException.class, () -> TabulatedInlet.of(
            TransportParameters.of(-1, 1), InletCondition.THIRD_TYPE, new double[] {0},
            new double[] {1}));
        final Solution1D ok = TabulatedInlet.of(p, InletCondition.FIRST_TYPE, new double[] {0},
            new double[] {1});
        assertThrows(IllegalArgumentException.class, () -> ok.value(-1, 1));
        assertThrows(IllegalArgumentException.class, () -> ok.value(1, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> FunctionInlet.of(
            TransportParameters.of(0, 1), InletCondition.THIRD_TYPE, s -> 1));
        assertThrows(IllegalArgumentException.class, () -> FunctionInlet.of(p,
            InletCondition.FIRST_TYPE, s -> Double.NaN).value(1, 1));
    }
}
