package org.advecta.solution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;
import org.advecta.special.ErrorFunctions;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Published worked examples of the first-type inlet (Ogata–Banks) solution.
 *
 * <p>Both textbooks report only the first term, ½C₀·erfc((x − vt)/(2√(Dt))), and call the
 * second term, ½C₀·exp(vx/D)·erfc((x + vt)/(2√(Dt))), negligible; at their vx/D of 16 and 42
 * it is not. Each test therefore checks (1) the book's own intermediate numbers and its
 * first-term answer, (2) the library's full solution against a 50-digit mpmath evaluation of
 * the same inputs (fixture worked_examples.csv, written by gen_worked_examples.py, which also
 * checks the closed form by numerical Laplace inversion), and (3) how far apart the two are.
 */
class WorkedExamplesTest {

    private static final Map<String, String[]> ROWS = new HashMap<>();

    @BeforeAll
    static void readFixture() throws IOException {
        try (InputStream in = WorkedExamplesTest.class.getResourceAsStream(
                "/fixtures/examples/worked_examples.csv");
             BufferedReader r = new BufferedReader(new InputStreamReader(in,
                 StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                if (!line.startsWith("#") && !line.startsWith("name,")) {
                    final String[] f = line.split(",");
                    ROWS.put(f[0], f);
                }
            }
        }
    }

    /** Relative error of a double against a decimal reference. */
    private static double relativeError(double computed, String reference) {
        final BigDecimal exact = new BigDecimal(reference);
        return new BigDecimal(computed).subtract(exact).abs()
            .divide(exact.abs(), java.math.MathContext.DECIMAL64).doubleValue();
    }

    /**
     * Fetter, C. W. (1994), Applied Hydrogeology, 3rd ed., Prentice Hall: chloride leachate
     * (725 mg/L) from a landfill; K = 3.0e-3 cm/s, dh/dl = 0.0020, n_e = 0.23,
     * D = 2.4e-7 m²/s, R = 1; concentration at 15 m after 1 year (3.15e7 s), "approximately
     * 30 mg/L". The numbers were taken from a public reproduction of the example, not from
     * the book itself.
     */
    @Test
    void fetter1994LandfillChloride() {
        final String[] row = ROWS.get("fetter1994_landfill_chloride");
        final double v = 3.0e-5 * 0.0020 / 0.23; // v = K·(dh/dl)/n_e, K in m/s
        assertEquals(Double.parseDouble(row[2]), v, 0.0, "fixture input is the same double");
        final double c0 = 725;
        final double d = 2.4e-7;
        final double x = 15;
        final double t = 3.15e7;
        final FirstTypeInlet inlet = FirstTypeInlet.of(TransportParameters.of(v, d),
            InletInput.constant(c0));
        // (1) the book's answer is the first term alone, "approximately 30 mg/L"
        final double firstTerm = c0 / 2 * ErrorFunctions.erfc((x - v * t) / (2 * Math.sqrt(d * t)));
        assertEquals(30, firstTerm, 1.0);
        assertTrue(relativeError(firstTerm, row[7]) < 1e-14);
        // (2) the full solution against mpmath at 50 digits
        final double full = inlet.value(x, t);
        assertTrue(relativeError(full, row[6]) < 8 * 0x1.0p-53,
            () -> "full " + full + " vs " + row[6]);
        // (3) the dropped term is a third of the book's answer: 39.7 mg/L, not 30
        assertEquals(39.7, full, 0.05);
    }

    /**
     * van der Perk, M. (2013), Soil and Water Contamination, 2nd ed., CRC Press, Example
     * 11.5: a column fed with 500 mg/L chloride at v = 60 cm/d, D = 5·10⁻³ m²/d; the
     * concentration at x = 35 cm after 12 h. The book computes β₁ = 0.5, erfc(0.5) = 0.4795
     * (its Table 11.2), β₂ = 6.5 and an exponential "≈ 1.7·10¹⁸", and drops the second term
     * as "very small"; the first term gives 119.9 mg/L.
     */
    @Test
    void vanDerPerk2013ColumnChloride() {
        final String[] row = ROWS.get("vanderperk2013_column_chloride");
        final double c0 = 500;
        final double v = 0.6;
        final double d = 5e-3;
        final double x = 0.35;
        final double t = 0.5;
        final double beta1 = (x - v * t) / (2 * Math.sqrt(d * t));
        final double beta2 = (x + v * t) / (2 * Math.sqrt(d * t));
        assertEquals(0.5, beta1, 1e-12);
        assertEquals(6.5, beta2, 1e-12);
        assertEquals(0.4795, ErrorFunctions.erfc(beta1), 5e-5);
        assertEquals(1.7e18, Math.exp(v * x / d), 0.05e18);
        final double firstTerm = c0 / 2 * ErrorFunctions.erfc(beta1);
        assertEquals(119.9, firstTerm, 0.05);
        assertTrue(relativeError(firstTerm, row[7]) < 1e-14);
        final double full = FirstTypeInlet.of(TransportParameters.of(v, d),
            InletInput.constant(c0)).value(x, t);
        assertTrue(relativeError(full, row[6]) < 8 * 0x1.0p-53,
            () -> "full " + full + " vs " + row[6]);
        // the "very small" second term is 16.7 mg/L, 14 % of the answer
        assertEquals(136.6, full, 0.05);
    }
}
