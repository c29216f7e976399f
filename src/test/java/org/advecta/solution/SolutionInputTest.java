package org.advecta.solution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Invalid input is rejected with the parameter's name; documented t = 0 values hold. */
class SolutionInputTest {

    private static final TransportParameters P = TransportParameters.of(1, 0.1).withDecay(0.01);

    private static void assertRejected(String name, Runnable call) {
        final IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            call::run);
        assertTrue(e.getMessage().startsWith(name), e::getMessage);
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
    void nonFiniteArgumentsAreRejected(double bad) {
        final Solution1D step = InitialStep.of(P, 0, 1, InitialStep.Side.LEFT);
        assertRejected("x", () -> step.value(bad, 1));
        assertRejected("t", () -> step.value(0, bad));
        assertRejected("x", () -> step.gradient(bad, 1));
        assertRejected("x0", () -> InitialStep.of(P, bad, 1, InitialStep.Side.LEFT));
        assertRejected("c0", () -> InitialStep.of(P, 0, bad, InitialStep.Side.LEFT));
        assertRejected("a", () -> InitialSlug.of(P, bad, 1, 1));
        assertRejected("b", () -> InitialSlug.of(P, 0, bad, 1));
        assertRejected("xc", () -> InitialGaussian.of(P, bad, 1, 1));
        assertRejected("s0", () -> InitialGaussian.of(P, 0, bad, 1));
        assertRejected("mass", () -> InitialGaussian.of(P, 0, 1, bad));
        assertRejected("cb", () -> DecayingBackground.of(P, bad));
        assertRejected("c0", () -> InletInput.constant(bad));
        assertRejected("t0", () -> InletInput.pulse(1, bad));
        assertRejected("lambda", () -> InletInput.exponential(1, bad));
        assertRejected("ci", () -> FirstTypeInlet.of(P, InletInput.constant(1))
            .withInitialConcentration(bad));
    }

    @Test
    void outOfDomainValuesAreRejected() {
        final FirstTypeInlet inlet = FirstTypeInlet.of(P, InletInput.constant(1));
        assertRejected("x", () -> inlet.value(-1e-300, 1));
        assertRejected("x", () -> inlet.gradient(-1, 1));
        assertRejected("t", () -> inlet.value(1, -1e-300));
        assertRejected("t", () -> inlet.breakthrough(1, new double[] {1, -1}, new double[2]));
        assertRejected("b", () -> InitialSlug.of(P, 1, 1, 1));
        assertRejected("s0", () -> InitialGaussian.of(P, 0, 0, 1));
        assertRejected("t0", () -> InletInput.pulse(1, 0));
        assertRejected("v", () -> ThirdTypeInlet.of(TransportParameters.of(0, 1),
            InletInput.constant(1)));
        assertRejected("v", () -> ThirdTypeInlet.of(TransportParameters.of(-1, 1),
            InletInput.constant(1)));
        // exponential input beyond the closed form: λ > (μ + v²/(4D))/R
        assertRejected("lambda", () -> FirstTypeInlet.of(TransportParameters.of(1, 1),
            InletInput.exponential(1, 0.26)));
        FirstTypeInlet.of(TransportParameters.of(1, 1), InletInput.exponential(1, 0.25));
        assertThrows(IllegalArgumentException.class, () -> FirstTypeInlet.of(null,
            InletInput.constant(1)));
        assertThrows(IllegalArgumentException.class, () -> FirstTypeInlet.of(P, null));
        assertThrows(IllegalArgumentException.class, () -> InitialStep.of(P, 0, 1, null));
        assertThrows(IllegalStateException.class, () -> InitialStep.of(
            TransportParameters.of(0, 1), 0, 1, InitialStep.Side.LEFT).fluxAveraged(0, 1));
    }

    @Test
    void documentedValuesAtTimeZero() {
        // InitialStep javadoc: C₀ on the loaded side, 0 on the other, C₀/2 at x₀
        final InitialStep left = InitialStep.of(P, 1, 4, InitialStep.Side.LEFT);
        assertEquals(4, left.value(0, 0));
        assertEquals(0, left.value(2, 0));
        assertEquals(2, left.value(1, 0));
        assertEquals(Double.NEGATIVE_INFINITY, left.gradient(1, 0));
        assertEquals(0, left.gradient(0, 0));
        final InitialStep right = InitialStep.of(P, 1, 4, InitialStep.Side.RIGHT);
        assertEquals(0, right.value(0, 0));
        assertEquals(4, right.value(2, 0));
        // InitialSlug: C₀ inside, 0 outside, C₀/2 at the ends, ±∞ gradient at the ends
        final InitialSlug slug = InitialSlug.of(P, -1, 1, 2);
        assertEquals(2, slug.value(0, 0));
        assertEquals(1, slug.value(1, 0));
        assertEquals(0, slug.value(3, 0));
        assertEquals(Double.POSITIVE_INFINITY, slug.gradient(-1, 0));
        assertEquals(Double.NEGATIVE_INFINITY, slug.gradient(1, 0));
        // FirstTypeInlet: Cᵢ for x > 0, g(0⁺) at x = 0
        final FirstTypeInlet first = FirstTypeInlet.of(P, InletInput.pulse(3, 1))
            .withInitialConcentration(0.5);
        assertEquals(3, first.value(0, 0));
        assertEquals(0.5, first.value(2, 0));
        assertEquals(Double.NEGATIVE_INFINITY, first.gradient(0, 0));
        // ThirdTypeInlet: Cᵢ everywhere, gradient (v/D)(Cᵢ − g(0⁺)) at x = 0
        final ThirdTypeInlet third = ThirdTypeInlet.of(P, InletInput.constant(3))
            .withInitialConcentration(0.5);
        assertEquals(0.5, third.value(0, 0));
        assertEquals(1 / 0.1 * (0.5 - 3), third.gradient(0, 0), 1e-15);
        // InletInput.valueAt: at t = t₀ a pulse is still on
        assertEquals(3, InletInput.pulse(3, 1).valueAt(1));
        assertEquals(0, InletInput.pulse(3, 1).valueAt(Math.nextUp(1.0)));
    }

    @Test
    void batchMethodsMatchScalarCalls() {
        final ThirdTypeInlet c = ThirdTypeInlet.of(P, InletInput.pulse(1, 2));
        final double[] x = {0, 0.5, 1, 2, 5};
        final double[] out = new double[x.length];
        c.values(x, 3, out);
        for (int i = 0; i < x.length; i++) {
            assertEquals(c.value(x[i], 3), out[i], 0.0);
        }
        final double[] t = {0, 0.5, 1, 2, 5};
        c.breakthrough(1, t, t);
        assertEquals(c.value(1, 5), t[4], 0.0, "out may alias the input");
    }
}
