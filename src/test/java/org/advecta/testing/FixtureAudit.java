package org.advecta.testing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.EnumMap;
import java.util.Map;
import org.advecta.testing.ReferenceTable.Flag;
import org.advecta.testing.ReferenceTable.Row;

/**
 * Checks on a fixture file itself, so that an empty or mislabelled fixture cannot pass
 * silently: its header records where it came from, and it has rows of every flag it claims.
 */
public final class FixtureAudit {

    private FixtureAudit() {
    }

    /**
     * The least number of rows of each flag.
     *
     * @param normal rows flagged normal
     * @param subnormal rows flagged subnormal
     * @param underflow rows flagged underflow
     * @param zero rows flagged zero
     * @return the map
     */
    public static Map<Flag, Integer> leastRows(int normal, int subnormal, int underflow,
                                               int zero) {
        final Map<Flag, Integer> m = new EnumMap<>(Flag.class);
        m.put(Flag.NORMAL, normal);
        m.put(Flag.SUBNORMAL, subnormal);
        m.put(Flag.UNDERFLOW, underflow);
        m.put(Flag.ZERO, zero);
        return m;
    }

    /**
     * The header names the generator (which is on the classpath beside the file), the
     * mpmath version, the precision, the date and the independent check.
     *
     * @param table the fixture
     * @param generator the generator script's file name
     * @param dir the fixture's classpath directory, ending in a slash
     */
    public static void checkProvenance(ReferenceTable table, String generator, String dir) {
        assertEquals(generator, table.header("generator").orElse(null),
            table.fileName() + ": header must record the generator");
        assertTrue(ReferenceTable.exists(dir + generator),
            generator + " must be committed beside " + table.fileName());
        assertTrue(table.header("mpmath").filter(v -> !v.isBlank()).isPresent(),
            table.fileName() + ": header must record the mpmath version");
        for (String key : new String[] {"working precision", "date", "independent check"}) {
            assertTrue(table.header(key).filter(v -> !v.isBlank()).isPresent(),
                table.fileName() + ": header must record the " + key);
        }
        assertFalse(table.header("independent check").orElse("").startsWith("none"),
            table.fileName() + ": the independent check must have run");
    }

    /**
     * Each flag the test requires is claimed by the header and has at least the required
     * number of rows; every claimed flag has rows; each flag agrees with its value.
     *
     * @param table the fixture
     * @param least the least number of rows of each flag (0: not required)
     */
    public static void checkCoverage(ReferenceTable table, Map<Flag, Integer> least) {
        final Map<Flag, Integer> counts = table.flagCounts();
        for (Map.Entry<Flag, Integer> e : least.entrySet()) {
            if (e.getValue() > 0) {
                assertTrue(table.claimedFlags().contains(e.getKey()),
                    table.fileName() + " must claim to cover " + e.getKey().cell());
            }
        }
        for (Flag f : table.claimedFlags()) {
            final int need = Math.max(1, least.getOrDefault(f, 1));
            final int have = counts.getOrDefault(f, 0);
            assertTrue(have >= need, table.fileName() + ": " + have + " rows flagged "
                + f.cell() + ", at least " + need + " required");
        }
        final BigDecimal minNormal = new BigDecimal(Double.MIN_NORMAL);
        final BigDecimal halfMin = new BigDecimal(Double.MIN_VALUE).divide(BigDecimal.valueOf(2));
        for (Row r : table.rows()) {
            if (r.flag() == Flag.UNDERFLOW) {
                continue;    // far-underflowing exponents can exceed BigDecimal's range
            }
            final BigDecimal v = r.value().abs();
            final boolean ok;
            switch (r.flag()) {
                case NORMAL:
                    ok = v.compareTo(minNormal) >= 0;
                    break;
                case SUBNORMAL:
                    ok = v.compareTo(minNormal) < 0 && v.compareTo(halfMin) >= 0;
                    break;
                default:
                    ok = v.signum() == 0;
                    break;
            }
            assertTrue(ok, "flag does not match value at " + r);
        }
    }
}
