package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import org.advecta.testing.FixtureAudit;
import org.advecta.testing.ReferenceTable;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * Route 2 against mpmath: piecewise-linear data with kinks, a jump, a constant extension
 * and cell averages, convolved by 50/60-digit quadrature (gen_convolution.py). All data are
 * non-negative, so the contract (48 + 4κ)·2⁻⁵³ of Σ|contributions| is relative here.
 */
class ProfileConvolutionReferenceTest {

    private static final String DIR = "fixtures/convolution/";
    private static final double U = 0x1.0p-53;

    private static Map<String, PiecewiseLinearProfile> profiles(ReferenceTable table) {
        final Map<String, PiecewiseLinearProfile> map = new HashMap<>();
        for (String c : table.comments()) {
            // "profile NAME: nodes=a b c; values=...; extension=zero"
            final String line = c.startsWith("#") ? c.substring(1).trim() : c.trim();
            if (!line.startsWith("profile ")) {
                continue;
            }
            final String name = line.substring(8, line.indexOf(':'));
            final String[] parts = line.substring(line.indexOf(':') + 1).split(";");
            final double[] nodes = parse(parts[0]);
            final double[] values = parse(parts[1]);
            final String ext = parts[2].substring(parts[2].indexOf('=') + 1).trim();
            map.put(name, PiecewiseLinearProfile.of(nodes, values,
                PiecewiseLinearProfile.Extension.valueOf(ext.toUpperCase(Locale.ROOT))));
        }
        return map;
    }

    private static double[] parse(String part) {
        final String[] cells = part.substring(part.indexOf('=') + 1).trim().split(" ");
        final double[] d = new double[cells.length];
        for (int i = 0; i < cells.length; i++) {
            d[i] = Double.parseDouble(cells[i]);
        }
        return d;
    }

    @Test
    void valuesWithinTheContract() {
        final ReferenceTable table = ReferenceTable.load(DIR + "profile_convolution.csv");
        FixtureAudit.checkProvenance(table, "gen_convolution.py", DIR);
        final Map<String, PiecewiseLinearProfile> profiles = profiles(table);
        assertEquals(3, profiles.size());
        double worst = 0;
        double worstOverCond = 0;
        int rows = 0;
        for (ReferenceTable.Row r : table.rows()) {
            final TransportParameters p = TransportParameters.of(r.getDouble("v"), r.getDouble("D"))
                .withRetardation(r.getDouble("R")).withDecay(r.getDouble("mu"));
            final double v = ProfileConvolution.of(p, profiles.get(r.get("profile")))
                .value(r.getDouble("x"), r.getDouble("t"));
            final BigDecimal exact = r.value();
            final double ref = exact.doubleValue();
            final double err = Math.abs(new BigDecimal(v).subtract(exact,
                MathContext.DECIMAL128).doubleValue());
            final double cond = r.cond();
            final double units = ref == 0 ? 0 : err / (Math.abs(ref) * U);
            worst = Math.max(worst, units);
            worstOverCond = Math.max(worstOverCond, units / (48 + 4 * cond));
            if (r.flag() == ReferenceTable.Flag.NORMAL) {
                assertTrue(units <= 48 + 4 * cond, r.line() + " got " + v + " (" + units
                    + " units of 2^-53)");
            } else {
                assertTrue(err <= 4 * Double.MIN_VALUE, r.line() + " got " + v);
            }
            rows++;
        }
        System.out.printf("profile fixture: %d rows, worst %.3g units of 2^-53, "
            + "worst fraction of the (48 + 4 cond) contract %.3g%n", rows, worst, worstOverCond);
        assertTrue(rows >= 150);
    }
}
