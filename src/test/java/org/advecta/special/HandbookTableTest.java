package org.advecta.special;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * erfc against a published table, as an outside check that needs no generator.
 *
 * <p>Source: M. van der Perk (2013), <i>Soil and Water Contamination</i>, 2nd ed., CRC Press,
 * Table 11.2 "The complementary error function erfc(β)", six decimals; values read from a
 * public reproduction of that page, not recalled from memory. The table rounds to 1e-6, so
 * the check is to half a unit of its last place.
 */
class HandbookTableTest {

    @ParameterizedTest(name = "erfc({0}) = {1}")
    @CsvSource({
        "-3.0, 1.999978", "-2.0, 1.995322", "-1.0, 1.842701", "-0.95, 1.820891",
        "-0.5, 1.520500", "-0.05, 1.056372", "0, 1.000000", "0.05, 0.943628",
        "0.25, 0.723674", "0.5, 0.479500", "1.0, 0.157299", "1.1, 0.119795",
        "1.5, 0.033895", "2.0, 0.004678", "2.5, 0.000407", "3.0, 0.000022"})
    void erfcMatchesTheTable(double beta, double tabulated) {
        assertEquals(tabulated, ErrorFunctions.erfc(beta), 0.5e-6);
    }
}
