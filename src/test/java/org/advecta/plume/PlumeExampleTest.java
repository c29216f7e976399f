package org.advecta.plume;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import org.advecta.quadrature.Estimate;
import org.advecta.testing.ReadmeSnippet;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * README's example of continuous sources, kept compiling, sane (values finite and positive,
 * the finite-time value below the steady one, the bound small) and in sync with README
 * (every code line of the block below must appear there).
 */
class PlumeExampleTest {

    @Test
    void readmeExample() throws IOException {
        // --- README's example, verbatim ---
        TransportParameters p = TransportParameters.of(0.5, 0.1)      // v, D_L
            .withDispersion(0.1, 0.01, 0.001).withRetardation(2.0).withDecay(1e-3);
        PointSource3D leak = PointSource3D.of(p, 0, 0, 0, 2.5);        // rate q at the origin
        double c = leak.value(10, 0.5, 0, 30);                          // c(x, y, z, t)
        double cs = leak.steadyValue(10, 0.5, 0);
        Estimate e = LineSource2D.of(p, 0, 0, 1.0).estimate(10, 0.5, 30); // value ± bound
        PatchSource3D face = PatchSource3D.of(p, 0, -5, 5, -2, 0, 1.0)
            .withWall(Wall.reflecting(Wall.Axis.Z, 0));                 // water table at z = 0
        // --- end of the example ---
        final double cp = face.value(10, 0.5, -1, 30);
        assertTrue(c > 0 && c < cs, c + " " + cs);
        assertTrue(e.value() > 0 && e.relativeError() < 1e-10, e.toString());
        assertTrue(cp > 0 && Double.isFinite(cp), Double.toString(cp));
        ReadmeSnippet.assertShownInReadme("src/test/java/org/advecta/plume/PlumeExampleTest.java", 8);
    }
}
