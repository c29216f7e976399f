package org.advecta.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InitialGaussian;
import org.advecta.solution.InitialSlug;
import org.advecta.solution.InitialStep;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.transport.TransportParameters;

/**
 * Invariants of cell averages for all families and inputs: additivity over adjacent cells,
 * the point value as the limit of a narrow cell, and conservation of a plume's mass.
 */
class CellAveragesProperties {

    /** A solution and its largest concentration. */
    static final class Case {
        final Solution1D solution;
        final double scale;

        Case(Solution1D solution, double scale) {
            this.solution = solution;
            this.scale = scale;
        }

        @Override
        public String toString() {
            return solution + " (max c " + scale + ")";
        }
    }

    @Provide
    Arbitrary<Case> cases() {
        final Arbitrary<TransportParameters> params = Combinators.combine(
                Arbitraries.doubles().between(0.1, 2).ofScale(3),
                Arbitraries.doubles().between(-3, 0).ofScale(3),
                Arbitraries.doubles().between(1, 3).ofScale(2),
                Arbitraries.doubles().between(0, 0.2).ofScale(3))
            .as((v, logD, r, mu) -> TransportParameters.of(v, Math.pow(10, logD))
                .withRetardation(r).withDecay(mu));
        final Arbitrary<Integer> kind = Arbitraries.integers().between(0, 5);
        return Combinators.combine(params, kind).as((p, k) -> {
            switch (k) {
                case 0:
                    return new Case(InitialStep.of(p, 0.3, 2, InitialStep.Side.LEFT), 2);
                case 1:
                    return new Case(InitialStep.of(p, 0.3, 2, InitialStep.Side.RIGHT), 2);
                case 2:
                    return new Case(InitialSlug.of(p, 0.1, 0.6, 1.5), 1.5);
                case 3:
                    return new Case(InitialGaussian.of(p, 0.2, 0.05, 0.4),
                        0.4 / (0.05 * Math.sqrt(2 * Math.PI)));
                case 4:
                    return new Case(FirstTypeInlet.of(p, InletInput.pulse(1.2, 0.7)), 1.2);
                default:
                    return new Case(ThirdTypeInlet.of(p, InletInput.constant(1.2)), 1.2);
            }
        });
    }

    @Property(tries = 300)
    void adjacentCellsAddUp(@ForAll("cases") Case c,
                            @ForAll @DoubleRange(min = 0, max = 3) double a,
                            @ForAll @DoubleRange(min = 0.01, max = 2) double w1,
                            @ForAll @DoubleRange(min = 0.01, max = 2) double w2,
                            @ForAll @DoubleRange(min = 0.01, max = 3) double t) {
        final double b = a + w1;
        final double e = b + w2;
        final Solution1D s = c.solution;
        final double left = CellAverages.average(s, a, b, t) * (b - a);
        final double right = CellAverages.average(s, b, e, t) * (e - b);
        final double whole = CellAverages.average(s, a, e, t) * (e - a);
        // each average is within 1e-15·max c (the contract); three of them, plus rounding
        assertEquals(whole, left + right, 4e-15 * c.scale * (e - a) + 1e-300);
    }

    @Property(tries = 300)
    void aNarrowCellAveragesToThePointValue(@ForAll("cases") Case c,
                                            @ForAll @DoubleRange(min = 0.01, max = 3) double x,
                                            @ForAll @DoubleRange(min = 0.01, max = 3) double t) {
        final TransportParameters p = c.solution.parameters();
        final double length = Math.sqrt(4 * p.dispersion() * t / p.retardation());
        final double h = 1e-5 * Math.min(length, 0.05);
        // c̄ − c(x) = (h²/6)·c''(ξ) for the cell [x − h, x + h]; |c''| ≤ max c · 2/L² for these
        // families, so the difference is below 1e-10·max c, far above the averages' rounding
        assertEquals(c.solution.value(x, t), CellAverages.average(c.solution, x - h, x + h, t),
            1e-9 * c.scale);
    }

    @Property(tries = 100)
    void plumesKeepTheirMass(@ForAll @DoubleRange(min = 0.1, max = 2) double v,
                             @ForAll @DoubleRange(min = 0.01, max = 0.5) double d,
                             @ForAll @DoubleRange(min = 0, max = 0.3) double mu,
                             @ForAll @DoubleRange(min = 0, max = 5) double t) {
        final TransportParameters p = TransportParameters.of(v, d).withDecay(mu);
        final double decay = Math.exp(-mu * t);
        final double spread = Math.sqrt(0.01 + 2 * d * t) * 40;
        final double centre = 0.2 + v * t;
        final Solution1D g = InitialGaussian.of(p, 0.2, 0.1, 0.4);
        assertEquals(0.4 * decay, CellAverages.average(g, centre - spread, centre + spread, t)
            * (2 * spread), 1e-15);
        final Solution1D slug = InitialSlug.of(p, -0.3, 0.4, 2.0);
        final double s2 = 0.7 + Math.sqrt(2 * d * t) * 40;
        final double c2 = 0.05 + v * t;
        assertEquals(1.4 * decay, CellAverages.average(slug, c2 - s2, c2 + s2, t) * (2 * s2),
            4e-15 * 2.0 * 2 * s2);
    }
}
