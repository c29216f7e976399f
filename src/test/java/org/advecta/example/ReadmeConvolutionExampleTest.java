package org.advecta.example;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import org.advecta.convolution.FunctionConvolution;
import org.advecta.convolution.GridMethod;
import org.advecta.convolution.HalfLineKernel;
import org.advecta.convolution.InletCondition;
import org.advecta.convolution.PiecewiseLinearProfile;
import org.advecta.convolution.ProfileConvolution;
import org.advecta.convolution.TabulatedInlet;
import org.advecta.halfspace.Wall;
import org.advecta.quadrature.Estimate;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.testing.ReadmeSnippet;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * README's example of convolution and time-varying inlets: kept compiling, running and in
 * sync with README (every code line of the block below must appear there).
 */
class ReadmeConvolutionExampleTest {

    @Test
    void readmeConvolutionExampleRuns() throws IOException {
        // --- README's example, verbatim ---
        TransportParameters p = TransportParameters.of(0.5, 0.01).withDecay(0.1);
        // measured profile (any grid; a repeated node is a jump)
        PiecewiseLinearProfile data = PiecewiseLinearProfile.of(
            new double[] {0, 1, 1, 3}, new double[] {0, 2, 1, 0}, PiecewiseLinearProfile.Extension.ZERO);
        double c = ProfileConvolution.of(p, data).value(2.0, 1.5);          // exact for the interpolant
        // a million samples onto a million points at once, with an error bound
        double[] samples = new double[1_000_000];
        for (int j = 0; j < samples.length; j++) {
            samples[j] = Math.exp(-Math.pow((j - 5e5) * 1e-3, 2));
        }
        double[] out = new double[samples.length];
        ProfileConvolution grid = ProfileConvolution.of(p, PiecewiseLinearProfile.uniform(-500, 1e-3,
            samples, PiecewiseLinearProfile.Extension.ZERO));
        double bound = grid.valuesOnGrid(-500, 1.5, out, GridMethod.AUTOMATIC);   // |out[i] − c| ≤ bound
        // a formula, with an error estimate
        Estimate e = FunctionConvolution.of(p, xi -> 1 / Math.cosh(xi)).value(2.0, 1.5);
        // a logged inlet series (piecewise constant): exact Duhamel superposition of Ogata–Banks
        Solution1D inlet = TabulatedInlet.of(p, InletCondition.FIRST_TYPE,
            new double[] {0, 2, 5}, new double[] {1.0, 0.4, 0.0});
        // the same log interpolated linearly: an exact sum of closed-form ramp responses
        double ramp = TabulatedInlet.linear(p, InletCondition.FIRST_TYPE,
            new double[] {0, 2, 5}, new double[] {1.0, 0.4, 0.0}).value(1.0, 3.0);
        // smooth data: Gauss–Hermite about the moving centre (adaptive fallback), with an estimate
        Estimate smooth = FunctionConvolution.of(p, xi -> 1 / Math.cosh(xi)).withSmoothData()
            .value(2.0, 1.5);
        // data on the half-line x ≥ 0 with a wall at x = 0 (absorbing or zero flux)
        ProfileConvolution nearWall = ProfileConvolution.of(HalfLineKernel.of(p, Wall.ZERO_FLUX),
            PiecewiseLinearProfile.of(new double[] {0, 0.5, 1}, new double[] {1, 2, 0},
                PiecewiseLinearProfile.Extension.ZERO));
        double cw = nearWall.value(0.2, 1.0);
        Estimate fw = FunctionConvolution.of(HalfLineKernel.of(p, Wall.ABSORBING),
            xi -> xi * Math.exp(-xi)).value(0.2, 1.0);
        // --- end of the example ---
        assertTrue(c > 0 && c < 2, "c = " + c);
        assertTrue(bound >= 0 && bound < 1e-9, "bound = " + bound);
        // the grid point x = 0.5 (index 500500) against the same data evaluated point by point
        assertEquals(grid.value(0.5, 1.5), out[500_500], bound + 1e-15);
        assertTrue(e.error() >= 0 && e.error() < 1e-9 * Math.abs(e.value()), e.toString());
        // before the level changes at t = 2 the series is the constant input 1.0
        assertEquals(FirstTypeInlet.of(p, InletInput.constant(1.0)).value(1.0, 1.5),
            inlet.value(1.0, 1.5), 4 * Math.ulp(1.0));
        // the input never exceeds 1 and is positive until t = 5 (maximum principle)
        assertTrue(ramp > 0 && ramp < 1, "ramp = " + ramp);
        // the smooth route and the adaptive route agree within their estimates
        assertEquals(e.value(), smooth.value(), e.error() + smooth.error());
        assertTrue(cw > 0 && fw.value() > 0, cw + " " + fw);
        ReadmeSnippet.assertShownInReadme("src/test/java/org/advecta/example/ReadmeConvolutionExampleTest.java", 20);
    }
}
