package org.advecta.solution;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.advecta.testing.FixtureAudit;
import org.advecta.testing.FixtureCheck;
import org.advecta.testing.FixtureCheck.Tolerance;
import org.advecta.testing.ReferenceTable;
import org.advecta.testing.ReferenceTable.Flag;
import org.advecta.testing.ReferenceTable.Row;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * The ramp responses against ramp_inlet.csv (gen_ramp.py: mpmath Duhamel quadrature of the
 * impulse responses at 45+ digits, an independent route; closed forms checked against it
 * and against numerical Laplace inversion there). Every row is held to the class's
 * contract, max(16, 2κ) ULP, the flux inlet with decay included.
 */
class InletRampReferenceTest {

    private static final String DIR = "fixtures/solution/";
    private static final Tolerance CONTRACT = Tolerance.conditioned(16, 2);

    private static InletRamp ramp(Row r) {
        final TransportParameters p = TransportParameters.of(r.getDouble("v"), r.getDouble("D"))
            .withRetardation(r.getDouble("R")).withDecay(r.getDouble("mu"));
        return r.get("inlet").equals("third") ? InletRamp.thirdType(p) : InletRamp.firstType(p);
    }

    @Test
    void closedFormsMatchTheReference() {
        final ReferenceTable table = ReferenceTable.load(DIR + "ramp_inlet.csv");
        FixtureAudit.checkProvenance(table, "gen_ramp.py", DIR);
        FixtureAudit.checkCoverage(table, FixtureAudit.leastRows(230, 8, 26, 0));
        final FixtureCheck check = new FixtureCheck(table, CONTRACT).withConditionedSubnormals();
        int decaying = 0;
        for (Row r : table.rows()) {
            final InletRamp w = ramp(r);
            final boolean decayFlux = w.isThirdType() && r.getDouble("mu") > 0;
            check.check(r, decayFlux ? "third, decay" : r.get("inlet"),
                w.value(r.getDouble("x"), r.getDouble("t")));
            decaying += decayFlux && r.flag() == Flag.NORMAL ? 1 : 0;
        }
        check.finish();
        assertTrue(decaying >= 50, "normal rows of the flux inlet with decay: " + decaying);
    }

    @Test
    void decayingFluxInletMatchesItsOwnFixture() {
        // gen_ramp_decay.py: the same independent route (Duhamel quadrature at 45+ digits) at
        // μ down to 1e-12 (u − v ≈ 1e-13·v), μ ≫ v²/(4D), Péclet 1e6 and 1e8 at the front,
        // and at and beside the inlet
        checkEveryRow("ramp_decay_flux.csv", "gen_ramp_decay.py",
            FixtureAudit.leastRows(40, 0, 0, 0), "third, decay");
    }

    @Test
    void firstTypeWithFlowTowardsTheInletMatchesItsFixture() {
        // gen_ramp_upstream.py: v < 0, the same independent route (Duhamel quadrature at 45+
        // digits), points within 0.5, 5 and 30 layer widths D/|v| of the inlet
        checkEveryRow("ramp_upstream.csv", "gen_ramp_upstream.py",
            FixtureAudit.leastRows(60, 0, 6, 0), "first, v < 0");
    }

    private static void checkEveryRow(String file, String generator,
                                      Map<Flag, Integer> least, String label) {
        final ReferenceTable table = ReferenceTable.load(DIR + file);
        FixtureAudit.checkProvenance(table, generator, DIR);
        FixtureAudit.checkCoverage(table, least);
        final FixtureCheck check = new FixtureCheck(table, CONTRACT).withConditionedSubnormals();
        for (Row r : table.rows()) {
            check.check(r, label, ramp(r).value(r.getDouble("x"), r.getDouble("t")));
        }
        check.finish();
    }
}
