package org.advecta.example;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import org.advecta.halfspace.HalfSpaceKernel1D;
import org.advecta.halfspace.HalfSpaceKernel3D;
import org.advecta.halfspace.Wall;
import org.advecta.halfspace.WallAxis;
import org.advecta.testing.ReadmeSnippet;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * README's example of walls: kept compiling, running and in sync with README (every code line
 * of the block below must appear there).
 */
class ReadmeHalfSpaceExampleTest {

    @Test
    void readmeHalfSpaceExampleRuns() throws IOException {
        // --- README's example, verbatim ---
        TransportParameters p = TransportParameters.of(-0.5, 0.02).withDecay(1e-3); // flow towards the wall
        HalfSpaceKernel1D k = HalfSpaceKernel1D.of(p, Wall.ABSORBING, 1.5);
        double c = k.value(0.3, 2.0);          // concentration per unit release
        double out = k.massOut(2.0);           // fraction that has left through the wall
        HalfSpaceKernel3D ground = HalfSpaceKernel3D.of(p, Wall.ZERO_FLUX, WallAxis.Z, 0, 0, 0.5);
        // --- end of the example ---
        assertTrue(c > 0 && out > 0 && out < 1, c + " " + out);
        // mass accounting: in the domain + out through the wall = 1 − decayed, and the decayed
        // part, ∫ (μ/R)·(mass in the domain) dt, lies between 0 and μt/R
        final double kept = k.massInDomain(2.0) + out;
        assertTrue(kept <= 1 && kept >= 1 - 1e-3 * 2.0, Double.toString(kept));
        assertTrue(ground.value(0.1, 0.2, 0.4, 1.0) > 0);
        ReadmeSnippet.assertShownInReadme("src/test/java/org/advecta/example/ReadmeHalfSpaceExampleTest.java", 5);
    }
}
