package org.advecta.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class TransportParametersTest {

    private static final TransportParameters BASE = TransportParameters.of(0.5, 0.02);

    @Test
    void defaultsAndDerivedQuantities() {
        final TransportParameters p = BASE.withRetardation(2.5).withDecay(0.01);
        assertEquals(0.5, p.velocity());
        assertEquals(0.02, p.dispersion());
        assertEquals(0.02, p.transverseDispersion());
        assertEquals(0.02, p.verticalDispersion());
        assertEquals(2.5, p.retardation());
        assertEquals(0.01, p.decayRate());
        assertEquals(0.2, p.retardedVelocity());
        // Pe = |v| L / D; Da = μ L / |v| (definitions: common practice).
        assertEquals(0.5 * 10 / 0.02, p.pecletNumber(10));
        assertEquals(0.01 * 10 / 0.5, p.damkohlerNumber(10));
        assertEquals(1.0, BASE.retardation());
        assertEquals(0.0, BASE.decayRate());
        assertEquals(0.0, BASE.damkohlerNumber(10), "no decay, no reaction");
        assertEquals(Double.POSITIVE_INFINITY,
            TransportParameters.of(0, 1).withDecay(1).damkohlerNumber(1));
        assertEquals(0.5 * 3 / 0.02, TransportParameters.of(-0.5, 0.02).pecletNumber(3),
            "Péclet number uses |v|");
    }

    @Test
    void decayOnBothPhasesEntersTheEquationAsKTimesR() {
        final TransportParameters p = BASE.withRetardation(3).withDecayOnBothPhases(0.2);
        assertEquals(0.2 * 3, p.decayRate(), 1e-16);
        assertTrue(p.isDecayOnBothPhases());
        // μ follows R when R is changed afterwards
        assertEquals(0.2 * 5, p.withRetardation(5).decayRate(), 1e-16);
        // the dissolved-phase convention does not
        assertEquals(0.2, BASE.withDecay(0.2).withRetardation(5).decayRate());
        assertNotEquals(BASE.withDecay(0.2), BASE.withDecayOnBothPhases(0.2));
        assertEquals(BASE.withDecay(0.2), BASE.withDecayOnBothPhases(0.2).withDecay(0.2));
        assertRejected("k", () -> BASE.withDecayOnBothPhases(-1));
        assertRejected("mu", () -> BASE.withRetardation(1e300).withDecayOnBothPhases(1e10));
    }

    @Test
    void anisotropicDispersion() {
        final TransportParameters p = BASE.withDispersion(1, 0.1, 0.01);
        assertEquals(1, p.dispersion());
        assertEquals(0.1, p.transverseDispersion());
        assertEquals(0.01, p.verticalDispersion());
    }

    @Test
    void valueSemantics() {
        assertEquals(TransportParameters.of(0.5, 0.02).withDecay(1), BASE.withDecay(1));
        assertEquals(BASE.withDecay(1).hashCode(), BASE.withDecay(1).hashCode());
        assertNotEquals(BASE, BASE.withRetardation(2));
        assertNotEquals(BASE, TransportParameters.of(-0.5, 0.02));
        assertTrue(BASE.toString().contains("v=0.5") && BASE.toString().contains("R=1.0"));
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
    void velocityMustBeFinite(double bad) {
        assertRejected("v", () -> TransportParameters.of(bad, 1));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, -0.0, -1, Double.NaN, Double.POSITIVE_INFINITY,
        Double.NEGATIVE_INFINITY})
    void dispersionMustBePositiveAndFinite(double bad) {
        assertRejected("D", () -> TransportParameters.of(1, bad));
        assertRejected("DL", () -> BASE.withDispersion(bad, 1, 1));
        assertRejected("DT", () -> BASE.withDispersion(1, bad, 1));
        assertRejected("DV", () -> BASE.withDispersion(1, 1, bad));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.999999, 0, -1, Double.NaN, Double.POSITIVE_INFINITY})
    void retardationMustBeAtLeastOne(double bad) {
        assertRejected("R", () -> BASE.withRetardation(bad));
    }

    @ParameterizedTest
    @ValueSource(doubles = {-1e-300, -1, Double.NaN, Double.POSITIVE_INFINITY})
    void decayMustBeNonNegative(double bad) {
        assertRejected("mu", () -> BASE.withDecay(bad));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0, -1, Double.NaN, Double.POSITIVE_INFINITY})
    void lengthsMustBePositive(double bad) {
        assertRejected("length", () -> BASE.pecletNumber(bad));
        assertRejected("length", () -> BASE.damkohlerNumber(bad));
    }

    /** Asserts the exception names the parameter and shows the offending value. */
    static void assertRejected(String name, Executable call) {
        final IllegalArgumentException e = assertThrows(IllegalArgumentException.class, call::run);
        assertTrue(e.getMessage().startsWith(name + " = "), e::getMessage);
    }

    /** A call that may throw (JUnit's Executable, restated to keep this class standalone). */
    interface Executable {
        void run();
    }
}
