package org.advecta.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The family registry, {@code list}, and the closed-form amounts behind the mass balance. */
class FamiliesTest {

    /** A valid value for every required key of every family. */
    private static final Map<String, Object> REQUIRED = Map.ofEntries(
        Map.entry("v", "0.5"), Map.entry("D", "0.1"), Map.entry("a", "-1"), Map.entry("b", "1"),
        Map.entry("s0", "0.2"), Map.entry("DT", "0.05"), Map.entry("DV", "0.01"),
        Map.entry("y1", "-1"), Map.entry("y2", "1"), Map.entry("z1", "-1"), Map.entry("z2", "1"),
        Map.entry("wall", "absorbing"), Map.entry("axis", "x"), Map.entry("x0", "1"),
        Map.entry("y0", "1"), Map.entry("z0", "1"));

    private static Params params(Family f, Map<String, Object> extra) {
        final Map<String, Object> raw = new LinkedHashMap<>();
        for (ParamSpec p : f.params()) {
            if (p.isRequired()) {
                raw.put(p.key(), REQUIRED.get(p.key()));
            }
        }
        raw.putAll(extra);
        return Params.of(f, raw);
    }

    @Test
    void registryIsWellFormed() {
        final Set<String> names = new HashSet<>();
        for (Family f : Families.ALL) {
            assertTrue(f.name().matches("[a-z][a-z0-9]*(-[a-z0-9]+)*"), f.name());
            assertTrue(names.add(f.name()), "two families named " + f.name());
            assertTrue(f.dimensions() >= 1 && f.dimensions() <= 3);
            assertEquals(f.dimensions() + 1, f.coordinates().size());
            final Set<String> keys = new HashSet<>();
            for (ParamSpec p : f.params()) {
                assertTrue(keys.add(p.key()), f.name() + ": two keys " + p.key());
                assertTrue(p.key().matches("[A-Za-z][A-Za-z0-9]*"), p.key());
                assertTrue(!p.meaning().isBlank());
                if (p.defaultNumber() != null) {
                    assertEquals(p.defaultNumber(), p.check(p.defaultNumber()), p.key());
                }
                if (p.defaultChoice() != null) {
                    assertEquals(p.defaultChoice(), p.checkChoice(p.defaultChoice()));
                }
            }
            assertEquals(List.of("v", "D", "R", "mu"), f.params().subList(0, 4).stream()
                .map(ParamSpec::key).collect(java.util.stream.Collectors.toList()));
            final Field field = f.create(params(f, Map.of()));
            assertEquals(f.dimensions(), field.dimensions(), f.name());
            assertTrue(Double.isFinite(field.value(0.5, 0.1, 0.1, 1.0)), f.name());
            assertEquals(f, Families.find(f.name()));
        }
    }

    @Test
    void listShowsEveryFamilyKeyDefaultAndRange() {
        final String out = Cli.run("list").ok();
        for (Family f : Families.ALL) {
            assertTrue(out.contains(f.name() + "  (" + f.dimensions() + "D, "), f.name());
            for (ParamSpec p : f.params()) {
                assertTrue(out.contains("  " + p.key() + " "), p.key());
                assertTrue(out.contains(p.defaultText()));
                assertTrue(out.contains(p.rangeText()));
                assertTrue(out.contains(p.meaning()));
            }
        }
        final String slug = Cli.run("list", "slug").ok();
        assertTrue(slug.startsWith("slug  (1D, line; points: x, t)\n"), slug);
        assertTrue(slug.contains("  b    required  finite"), slug);
        assertTrue(!slug.contains("gaussian"));
        assertTrue(Cli.run("--help").ok().contains("list"));
        assertTrue(Cli.run("eval", "--help").ok().contains("--gradient"));
    }

    /**
     * The closed-form amount in solution (used by run's mass balance) against the trapezoidal
     * rule applied to the library's own c(x, t) on a fine grid reaching far past the front:
     * an independent route for the inlet balance, whose derivation is in Families.
     */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "inlet-third | v=0.6 D=5e-3 R=1.5 mu=0.01                                | 2.0",
        "inlet-third | v=0.6 D=5e-3 R=1.5 mu=0                                   | 2.0",
        "inlet-third | v=1 D=0.1 mu=0.2 Ci=0.3                                   | 3.0",
        "inlet-third | v=1 D=0.1 input=pulse C0=2 t0=0.5                         | 0.4",
        "inlet-third | v=1 D=0.1 R=2 mu=0.1 input=pulse C0=2 t0=0.5 Ci=0.1       | 3.0",
        "inlet-third | v=1 D=0.1 mu=0.05 input=exponential C0=2 lambda=0.3 Ci=-1 | 2.5",
        "inlet-third | v=1 D=0.1 input=exponential C0=2 lambda=-0.2              | 2.5",
        // μ/R = λ: the exponential's integral is t (its k = 0 branch)
        "inlet-third | v=1 D=0.1 R=1.25 mu=0.4 input=exponential lambda=0.32     | 2.5",
        "slug        | v=-1 D=0.1 mu=0.3 a=0 b=2 C0=3                            | 1.5",
        "gaussian    | v=1 D=0.1 R=2 mu=0.3 s0=0.2 M=3                           | 1.5",
        "release-1d  | v=1 D=0.1 R=2 mu=0.3 M=3                                  | 1.5"})
    void closedFormAmountMatchesQuadrature(String family, String args, double t) {
        final Family f = Families.find(family);
        final Params p = Params.of(f, EvalCommand.assignments(List.of(args.split(" "))));
        final Field field = f.create(p);
        final OptionalDouble exact = field.mass(t);
        assertTrue(exact.isPresent());
        final double v = p.get("v");
        final double r = p.get("R");
        final double spread = Math.sqrt(4 * p.get("D") * t / r);
        final double lo = f.name().startsWith("inlet") ? 0.0 : -Math.abs(v) * t / r - 40 * spread - 5;
        final double hi = Math.abs(v) * t / r + 40 * spread + 5;
        final int n = 400_000;
        final double h = (hi - lo) / n;
        final double bg = field.background(t);
        double sum = 0.5 * (field.value(lo, 0, 0, t) - bg + field.value(hi, 0, 0, t) - bg);
        for (int i = 1; i < n; i++) {
            sum += field.value(lo + i * h, 0, 0, t) - bg;
        }
        final double integral = sum * h;
        // The rule's own error (h²·c''/12 summed, largest where the inlet's profile bends at
        // x = 0) was measured at most 4e-10 relative on these rows; 1e-8 leaves a margin and
        // still catches any wrong factor or term in the closed forms.
        assertEquals(exact.getAsDouble(), integral, 1e-8 * Math.abs(exact.getAsDouble()),
            family + " " + args);
    }

    @Test
    void familiesWithoutAFiniteAmountSayNothing() {
        for (String name : List.of("step", "background", "inlet-first")) {
            final Family f = Families.find(name);
            assertTrue(f.create(params(f, Map.of())).mass(1.0).isEmpty(), name);
        }
    }
}
