package org.advecta.solution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * A profile ({@link Solution1D#values}) computes the time's quantities once; it must give the
 * very same doubles as {@link Solution1D#value} point by point, for every family, on the log
 * grid of {@link FiniteEverywhereTest} (Péclet numbers to 1e11, both flow directions, decay,
 * retardation, t = 0 included), and validate each point as value does.
 */
class ProfileTest {

    private static final double[] TIMES = {0, 1e-8, 1e-2, 1, 1e4, 1e8};

    @Test
    void aProfileEqualsItsPointsBitForBit() {
        final List<String> failures = new ArrayList<>();
        long points = 0;
        for (double v : FiniteEverywhereTest.V) {
            for (double d : FiniteEverywhereTest.D) {
                for (double r : FiniteEverywhereTest.R) {
                    for (double mu : FiniteEverywhereTest.MU) {
                        final TransportParameters p = TransportParameters.of(v, d)
                            .withRetardation(r).withDecay(mu);
                        for (Solution1D s : FiniteEverywhereTest.families(p)) {
                            final double[] x = positions(s.domain());
                            final double[] out = new double[x.length];
                            for (double t : TIMES) {
                                s.values(x, t, out);
                                for (int i = 0; i < x.length; i++) {
                                    points++;
                                    final double expected = s.value(x[i], t);
                                    if (Double.compare(out[i], expected) != 0) {
                                        failures.add(s.getClass().getSimpleName() + " " + p
                                            + " x=" + x[i] + " t=" + t + ": profile " + out[i]
                                            + ", point " + expected);
                                    }
                                }
                            }
                        }
                    }
                }
            }
        }
        assertTrue(points > 500_000, "only " + points + " points");
        assertEquals(List.of(), failures.subList(0, Math.min(10, failures.size())),
            failures.size() + " differences");
    }

    @Test
    void aProfileValidatesEachPointAndItsArrays() {
        final Solution1D s = FirstTypeInlet.of(TransportParameters.of(1, 0.1),
            InletInput.constant(1));
        final double[] out = new double[3];
        final IllegalArgumentException negative = assertThrows(IllegalArgumentException.class,
            () -> s.values(new double[] {0, 1, -1}, 1, out));
        assertTrue(negative.getMessage().startsWith("x = -1.0"), negative.getMessage());
        final IllegalArgumentException nan = assertThrows(IllegalArgumentException.class,
            () -> InitialStep.of(TransportParameters.of(1, 0.1), 0, 1, InitialStep.Side.LEFT)
                .values(new double[] {Double.NaN}, 1, out));
        assertTrue(nan.getMessage().startsWith("x = NaN"), nan.getMessage());
        final IllegalArgumentException time = assertThrows(IllegalArgumentException.class,
            () -> s.values(new double[] {1}, -1, out));
        assertTrue(time.getMessage().startsWith("t = -1.0"), time.getMessage());
        final IllegalArgumentException shortOut = assertThrows(IllegalArgumentException.class,
            () -> s.values(new double[] {1, 2, 3, 4}, 1, out));
        assertTrue(shortOut.getMessage().startsWith("out"), shortOut.getMessage());
    }

    private static double[] positions(Domain domain) {
        final double[] base = FiniteEverywhereTest.X;
        if (domain == Domain.HALF_LINE) {
            return base.clone();
        }
        final double[] both = new double[2 * base.length];
        for (int i = 0; i < base.length; i++) {
            both[2 * i] = base[i];
            both[2 * i + 1] = -base[i];
        }
        return both;
    }
}
