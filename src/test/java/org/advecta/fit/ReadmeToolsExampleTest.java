package org.advecta.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import org.advecta.moments.Moments;
import org.advecta.solution.InitialStep;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.testing.ReadmeSnippet;
import org.advecta.transport.TransportParameters;
import org.advecta.verify.CellAverages;
import org.advecta.verify.GridConvergenceIndex;
import org.advecta.verify.ObservedOrder;
import org.advecta.verify.TimeShiftedSolution;
import org.junit.jupiter.api.Test;

/**
 * README's usage example of verification, fitting and moments: kept compiling, running and
 * in sync with README (every code line of the block below must appear there).
 */
class ReadmeToolsExampleTest {

    @Test
    void readmeToolsExampleRuns() throws IOException {
        final double[] times = new double[100];
        final double[] measured = new double[100];
        final Solution1D column = ThirdTypeInletData.truth();
        for (int i = 0; i < times.length; i++) {
            times[i] = 0.05 * (i + 1);
            measured[i] = column.fluxAveraged(1.0, times[i]);
        }
        // --- README's example, verbatim ---
        Solution1D exact = TimeShiftedSolution.of(InitialStep.of(TransportParameters.of(1.0, 0.01),
            0.25, 1.0, InitialStep.Side.LEFT), 0.2);         // a step, smooth from t0 = 0.2 on
        double[] faces = {0.0, 0.1, 0.2, 0.3}, cells = new double[3];
        CellAverages.averages(exact, faces, 0.3, cells);     // exact cell averages at t = 0.3
        ObservedOrder order = ObservedOrder.of(new double[] {0.02, 0.01, 0.005},
            new double[] {4.1e-3, 1.0e-3, 2.6e-4});          // errors of a simulator vs exact
        double p = order.leastSquares();                     // observed order, here about 2
        GridConvergenceIndex gci = GridConvergenceIndex.of(0.005, 0.01, 0.02, 6.063, 5.972, 5.863);
        FitResult fit = ParameterFit.fit(TransportModel.of(
                ModelFamily.thirdTypeInlet(InletInput.pulse(1.0, 0.5)), Observable.FLUX_AVERAGED),
            Observations.breakthrough(1.0, times, measured)); // v and D free, guess from moments
        double v = fit.value(Parameter.VELOCITY), low = fit.lower95(Parameter.VELOCITY);
        Moments m = Moments.ofSamples(times, measured);      // mean arrival time, variance
        // --- end of the example ---
        assertEquals(2.0, p, 0.05);
        assertTrue(cells[2] > cells[0] || cells[2] <= 1.0);
        assertTrue(gci.fineGridIndex() > 0);
        assertTrue(fit.isConverged(), fit::toString);
        assertEquals(0.6, v, 1e-8);
        assertTrue(low <= v && v - low < 1e-10); // noise-free data: a very narrow interval
        assertEquals(1.0 / 0.6 + 0.25, m.mean(), 0.01);
        ReadmeSnippet.assertShownInReadme("src/test/java/org/advecta/fit/ReadmeToolsExampleTest.java", 12);
    }

    /** The column behind the example's data. */
    private static final class ThirdTypeInletData {
        static Solution1D truth() {
            return ModelFamily.thirdTypeInlet(InletInput.pulse(1.0, 0.5))
                .create(TransportParameters.of(0.6, 0.02), 1.0);
        }
    }
}
