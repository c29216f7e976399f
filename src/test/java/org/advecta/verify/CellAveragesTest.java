package org.advecta.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InitialGaussian;
import org.advecta.solution.InitialSlug;
import org.advecta.solution.InitialStep;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * Cell averages against 40-digit mpmath quadrature of the point formulas (fixture
 * verify/cell_averages.csv, written by gen_cell_averages.py): the independent route to the
 * library's antiderivatives and Gauss–Legendre rule.
 */
class CellAveragesTest {

    /** The accuracy stated in the javadoc: 1e-15 of the family's largest concentration. */
    private static final double TOLERANCE = 1e-15;

    private static List<Map<String, String>> rows() throws IOException {
        final List<Map<String, String>> rows = new ArrayList<>();
        try (InputStream in = CellAveragesTest.class.getResourceAsStream(
                "/fixtures/verify/cell_averages.csv");
             BufferedReader r = new BufferedReader(new InputStreamReader(in,
                 StandardCharsets.UTF_8))) {
            String[] header = null;
            String line;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#")) {
                    continue;
                }
                final String[] f = line.split(",");
                if (header == null) {
                    header = f;
                    continue;
                }
                final Map<String, String> row = new HashMap<>();
                for (int i = 0; i < f.length; i++) {
                    row.put(header[i], f[i]);
                }
                rows.add(row);
            }
        }
        return rows;
    }

    private static double d(Map<String, String> row, String key) {
        return Double.parseDouble(row.get(key));
    }

    /** The solution of a row and its largest concentration (the scale of the tolerance). */
    static Object[] solution(Map<String, String> row) {
        final TransportParameters p = TransportParameters.of(d(row, "v"), d(row, "D"))
            .withRetardation(d(row, "R")).withDecay(d(row, "mu"));
        final double p1 = d(row, "p1");
        final double p2 = d(row, "p2");
        final double p3 = d(row, "p3");
        switch (row.get("family")) {
            case "step_left":
                return new Object[] {InitialStep.of(p, p1, p2, InitialStep.Side.LEFT), p2};
            case "step_right":
                return new Object[] {InitialStep.of(p, p1, p2, InitialStep.Side.RIGHT), p2};
            case "slug":
                return new Object[] {InitialSlug.of(p, p1, p2, p3), p3};
            case "gaussian":
                return new Object[] {InitialGaussian.of(p, p1, p2, p3),
                    p3 / (p2 * Math.sqrt(2 * Math.PI))};
            case "first_type":
                return new Object[] {FirstTypeInlet.of(p, p2 == 0 ? InletInput.constant(p1)
                    : InletInput.pulse(p1, p2)), p1};
            case "third_type":
                return new Object[] {ThirdTypeInlet.of(p, InletInput.constant(p1)), p1};
            default:
                throw new IllegalArgumentException(row.get("family"));
        }
    }

    @Test
    void averagesMatchMpmathQuadrature() throws IOException {
        final List<Map<String, String>> rows = rows();
        assertTrue(rows.size() >= 49, "fixture rows: " + rows.size());
        double worst = 0;
        String worstCase = "";
        for (Map<String, String> row : rows) {
            final Object[] s = solution(row);
            final double scale = (Double) s[1];
            final double got = CellAverages.average((Solution1D) s[0], d(row, "a"), d(row, "b"),
                d(row, "t"));
            final double err = new BigDecimal(got).subtract(new BigDecimal(row.get("value")))
                .abs().doubleValue() / scale;
            if (err > worst) {
                worst = err;
                worstCase = row.toString();
            }
            assertTrue(err <= TOLERANCE, () -> "error " + err + " of max|c| in " + row
                + ", got " + got);
        }
        System.out.printf("cell averages: worst error %.3g of max|c| (%s)%n", worst, worstCase);
    }

    @Test
    void timeShiftedSolutionUsesTheWrappedClosedForm() throws IOException {
        final TransportParameters p = TransportParameters.of(0.5, 0.05).withRetardation(1.5);
        final InitialStep step = InitialStep.of(p, 0.25, 2.0, InitialStep.Side.RIGHT);
        final TimeShiftedSolution later = TimeShiftedSolution.of(step, 1.0);
        // the fixture's row: step_right on [0.5, 0.75] at t = 2.5
        final Map<String, String> row = rows().stream()
            .filter(r -> r.get("family").equals("step_right") && r.get("a").equals("0.5"))
            .findFirst().orElseThrow();
        final double exact = new BigDecimal(row.get("value")).doubleValue();
        assertEquals(exact, CellAverages.average(later, 0.5, 0.75, 1.5), 2e-14 * 2.0);
    }

    @Test
    void initialDataAveragesAreExactOverlaps() {
        final TransportParameters p = TransportParameters.of(1, 0.1);
        // step of 3 left of x0 = 1: [0, 4] holds 1 unit of length loaded -> 3/4
        assertEquals(0.75, CellAverages.average(InitialStep.of(p, 1, 3,
            InitialStep.Side.LEFT), 0, 4, 0), 0.0);
        assertEquals(2.25, CellAverages.average(InitialStep.of(p, 1, 3,
            InitialStep.Side.RIGHT), 0, 4, 0), 0.0);
        // slug of 2 on (1, 2): [0, 4] -> 2·1/4
        assertEquals(0.5, CellAverages.average(InitialSlug.of(p, 1, 2, 2), 0, 4, 0), 0.0);
        assertEquals(0.0, CellAverages.average(InitialSlug.of(p, 1, 2, 2), 3, 4, 0), 0.0);
        assertEquals(0.25, CellAverages.average(FirstTypeInlet.of(p, InletInput.constant(1))
            .withInitialConcentration(0.25), 0, 1, 0), 0.0);
    }

    @Test
    void gridAveragesEqualSingleCellAveragesAndMayOverwriteFaces() {
        final Solution1D s = InitialGaussian.of(TransportParameters.of(0.3, 0.01), 0, 0.1, 1);
        final double[] faces = {-0.5, -0.1, 0.0, 0.2, 0.7, 1.5};
        final double[] expected = new double[faces.length - 1];
        for (int i = 0; i < expected.length; i++) {
            expected[i] = CellAverages.average(s, faces[i], faces[i + 1], 1.0);
        }
        final double[] inPlace = faces.clone();
        CellAverages.averages(s, inPlace, 1.0, inPlace);
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i], inPlace[i], 0.0);
        }
    }

    @Test
    void invalidInputIsRejectedNamingTheArgument() {
        final Solution1D s = InitialGaussian.of(TransportParameters.of(0.3, 0.01), 0, 0.1, 1);
        final Solution1D inlet = FirstTypeInlet.of(TransportParameters.of(0.3, 0.01),
            InletInput.constant(1));
        assertMessage("b = 0.0", () -> CellAverages.average(s, 0, 0, 1));
        assertMessage("a = NaN", () -> CellAverages.average(s, Double.NaN, 1, 1));
        assertMessage("t = -1.0", () -> CellAverages.average(s, 0, 1, -1));
        assertMessage("a = -1.0", () -> CellAverages.average(inlet, -1, 1, 1));
        assertMessage("faces[2] = 0.5", () -> CellAverages.averages(s,
            new double[] {0, 1, 0.5}, 1, new double[2]));
        assertMessage("out", () -> CellAverages.averages(s, new double[] {0, 1, 2}, 1,
            new double[1]));
        assertMessage("solution", () -> CellAverages.average(null, 0, 1, 1));
        assertMessage("t0 = -1.0", () -> TimeShiftedSolution.of(s, -1));
    }

    static void assertMessage(String expected, org.junit.jupiter.api.function.Executable call) {
        final IllegalArgumentException e = assertThrows(IllegalArgumentException.class, call);
        assertTrue(e.getMessage().contains(expected), e.getMessage());
    }

    /** Relative difference used by other tests of the package. */
    static double relative(double computed, String reference) {
        final BigDecimal exact = new BigDecimal(reference);
        return new BigDecimal(computed).subtract(exact).abs()
            .divide(exact.abs(), MathContext.DECIMAL64).doubleValue();
    }
}
