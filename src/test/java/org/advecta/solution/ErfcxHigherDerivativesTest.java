package org.advecta.solution;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The erfcx derivatives behind the flux inlet's ramp responses against erfcx_higher.csv
 * (gen_erfcx_higher.py: mpmath.diff of exp(z²)erfc(z) at 60 digits, checked against the
 * recurrence at 120 digits). The Chebyshev series of {@link ErfcxHigherDerivatives} are held
 * to the few ulp their class comment states; χ of {@link ThirdTypeRampIntegral} and H⁗ of
 * {@link ThirdTypeDecayRamp} (which switch to other forms below −1 and from 10 on) to the
 * same bound over the whole file, [−3/2, 40].
 */
class ErfcxHigherDerivativesTest {

    /** The stated accuracy of the series and of the forms around them, in ulp. */
    private static final double ULP_BOUND = 4;

    private static List<BigDecimal[]> rows() throws IOException {
        final List<BigDecimal[]> out = new ArrayList<>();
        try (InputStream in = ErfcxHigherDerivativesTest.class.getClassLoader()
                 .getResourceAsStream("fixtures/solution/erfcx_higher.csv");
             BufferedReader r = new BufferedReader(new InputStreamReader(in,
                 StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#") || line.startsWith("z,")) {
                    continue;
                }
                final String[] f = line.split(",");
                final BigDecimal[] row = new BigDecimal[f.length];
                for (int i = 0; i < f.length; i++) {
                    row[i] = new BigDecimal(f[i]);
                }
                out.add(row);
            }
        }
        return out;
    }

    private static double ulps(double computed, BigDecimal exact) {
        final double e = exact.doubleValue();
        return Math.abs(new BigDecimal(computed).subtract(exact, MathContext.DECIMAL128)
            .doubleValue()) / Math.ulp(e);
    }

    @Test
    void seriesAreWithinAFewUlp() throws IOException {
        final List<BigDecimal[]> rows = rows();
        double worst = 0;
        int n = 0;
        for (BigDecimal[] row : rows) {
            final double z = row[0].doubleValue();
            if (z < ErfcxHigherDerivatives.FROM || z >= ErfcxHigherDerivatives.TO) {
                continue;
            }
            final double[] got = {ErfcxHigherDerivatives.psi(z), ErfcxHigherDerivatives.chi(z),
                ErfcxHigherDerivatives.omega(z), ErfcxHigherDerivatives.theta(z)};
            for (int k = 0; k < 4; k++) {
                final double u = ulps(got[k], row[k + 1]);
                worst = Math.max(worst, u);
                assertTrue(u <= ULP_BOUND, "z = " + z + " derivative " + (k + 2) + ": " + u
                    + " ulp");
            }
            n++;
        }
        System.out.printf("erfcx_higher.csv: %d points in [-1, 10), worst %.3g ulp%n", n, worst);
        assertTrue(n > 500, "points: " + n);
    }

    @Test
    void formsAroundTheSeriesAreWithinTheSameBound() throws IOException {
        double worst = 0;
        for (BigDecimal[] row : rows()) {
            final double z = row[0].doubleValue();
            worst = Math.max(worst, ulps(ThirdTypeRampIntegral.chi(z), row[2]));
            // H⁗ with Q = 0 is ϑ; with Q = 1/2 it is ω + ϑ
            worst = Math.max(worst, ulps(ThirdTypeDecayRamp.fourthDerivativeOfH(0, z), row[4]));
            worst = Math.max(worst, ulps(ThirdTypeDecayRamp.fourthDerivativeOfH(0.5, z),
                row[3].add(row[4])));
            assertTrue(worst <= ULP_BOUND, "z = " + z + ": " + worst + " ulp");
        }
        System.out.printf("erfcx_higher.csv: chi and H'''' over [-1.5, 40], worst %.3g ulp%n",
            worst);
    }
}
