package org.advecta.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.transport.TransportParameters;

/**
 * For all parameter sets in a practical range, a fit of noise-free data made by the library
 * recovers v and D to 1e-8 relative, starting from the moment-based guess alone.
 */
class FitProperties {

    @Property(tries = 40)
    void noiseFreeBreakthroughRecoversVAndD(
            @ForAll @DoubleRange(min = 0.05, max = 5) double v,
            @ForAll @DoubleRange(min = 5, max = 500) double peclet,
            @ForAll @DoubleRange(min = 1, max = 4) double r,
            @ForAll @DoubleRange(min = 0.5, max = 3) double x,
            @ForAll @IntRange(min = 0, max = 3) int kind) {
        final double d = v * x / peclet;
        final double travel = r * x / v;
        final ModelFamily family;
        final boolean flux;
        switch (kind) {
            case 0:
                family = ModelFamily.thirdTypeInlet(InletInput.pulse(1, 0.2 * travel));
                flux = true;
                break;
            case 1:
                family = ModelFamily.thirdTypeInlet(InletInput.pulse(1, 0.2 * travel));
                flux = false;
                break;
            case 2:
                family = ModelFamily.firstTypeInlet(InletInput.constant(1));
                flux = false;
                break;
            default:
                family = ModelFamily.firstTypeInlet(InletInput.exponential(1, 1 / travel));
                flux = false;
        }
        final Solution1D truth = family.create(TransportParameters.of(v, d).withRetardation(r),
            1.0);
        final int n = 60;
        final double[] t = new double[n];
        final double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = travel * (0.05 + 2.95 * i / (n - 1));
            c[i] = flux ? truth.fluxAveraged(x, t[i]) : truth.value(x, t[i]);
        }
        final FitResult fit = ParameterFit.fit(TransportModel.of(family,
                flux ? Observable.FLUX_AVERAGED : Observable.RESIDENT)
                .withValue(Parameter.RETARDATION, r),
            Observations.breakthrough(x, t, c));
        assertTrue(fit.isConverged(), fit::toString);
        assertEquals(v, fit.value(Parameter.VELOCITY), 1e-8 * v, fit::toString);
        assertEquals(d, fit.value(Parameter.DISPERSION), 1e-8 * d, fit::toString);
    }
}
