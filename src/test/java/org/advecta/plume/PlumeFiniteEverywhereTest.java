package org.advecta.plume;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.advecta.quadrature.Estimate;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * No NaN, infinity or exception on valid input, and no negative concentration or bound for a
 * positive rate: every source, value, steady value, error bound and mass flux, over a log grid of velocities (both directions, Péclet numbers up to
 * 1e9 per unit length), dispersion, retardation, decay, distances from 1e-6 to 1e4 and times
 * from the smallest double to 1e12.
 */
class PlumeFiniteEverywhereTest {

    private static final double[] V = {-1e3, -1, 0, 1e-3, 1, 1e3};
    private static final double[] D = {1e-6, 1e-2, 1, 1e3};
    private static final double[] MU = {0, 1e-3, 10};
    private static final double[] X = {-10, -1e-6, 0, 1e-6, 1, 1e4};
    private static final double[] Y = {0, 1e-3, 3};
    private static final double[] T = {Double.MIN_VALUE, 1e-12, 1e-3, 1, 1e3, 1e12};

    @Test
    void everySourceIsFiniteOnALogGrid() {
        final List<String> failures = new ArrayList<>();
        long n = 0;
        for (double v : V) {
            for (double d : D) {
                for (double mu : MU) {
                    final TransportParameters p = TransportParameters.of(v, d)
                        .withDispersion(d, d / 10, d / 100).withRetardation(2).withDecay(mu);
                    final boolean steady = v != 0 || mu > 0;
                    final PointSource3D point = PointSource3D.of(p, 0, 0, 0, 1);
                    final LineSource2D line = LineSource2D.of(p, 0, 0, 1);
                    final PatchSource3D patch = PatchSource3D.of(p, 0, -1, 1, -0.5, 0.5, 1);
                    for (double x : X) {
                        for (double y : Y) {
                            final boolean atSource = x == 0 && y == 0;
                            if (steady && !atSource) {
                                attempt(failures, "point steady", () -> point.steadyValue(x, y, 0.25), p, x, y, 0);
                                attempt(failures, "line steady", () -> line.steadyValue(x, y), p, x, y, 0);
                                attempt(failures, "patch steady", () -> patch.steadyEstimate(x, y, 0.25), p, x, y, 0);
                            }
                            for (double t : T) {
                                n++;
                                if (!atSource) {
                                    attempt(failures, "point", () -> point.value(x, y, 0.25, t), p, x, y, t);
                                    attempt(failures, "line", () -> line.estimate(x, y, t), p, x, y, t);
                                }
                                attempt(failures, "patch", () -> patch.estimate(x, y, 0.25, t), p, x, y, t);
                                if (x != 0) {
                                    attempt(failures, "flux", () -> point.massFlux(x, t), p, x, y, t);
                                }
                            }
                        }
                    }
                }
            }
        }
        assertEquals(List.of(), failures.subList(0, Math.min(20, failures.size())),
            failures.size() + " of " + n + " combinations not finite");
    }

    @Test
    void massFluxBesideAbsorbingWallsIsFiniteOnALogGrid() {
        final List<String> failures = new ArrayList<>();
        long n = 0;
        for (double v : V) {
            for (double d : D) {
                for (double mu : MU) {
                    final TransportParameters p = TransportParameters.of(v, d)
                        .withDispersion(d, d / 10, d / 100).withRetardation(2).withDecay(mu);
                    final boolean steady = v != 0 || mu > 0;
                    for (double a : new double[] {1e-6, 1, 1e4}) {
                        final Wall wy = Wall.absorbing(Wall.Axis.Y, -a);
                        final PointSource3D point = PointSource3D.of(p, 0, 0, 0, 1).withWall(wy)
                            .withWall(Wall.absorbing(Wall.Axis.Z, a));
                        final LineSource2D line = LineSource2D.of(p, 0, 0, 1).withWall(wy);
                        final PatchSource3D patch = PatchSource3D.of(p, 0, 0, 1, -0.5, 0.5, 1)
                            .withWall(wy);
                        for (double x : X) {
                            if (x == 0) {
                                continue;
                            }
                            if (steady) {
                                attempt(failures, "flux", () -> point.steadyMassFluxEstimate(x), p, x, a, 0);
                                attempt(failures, "flux", () -> patch.steadyMassFluxEstimate(x), p, x, a, 0);
                            }
                            for (double t : T) {
                                n++;
                                attempt(failures, "flux", () -> point.massFluxEstimate(x, t), p, x, a, t);
                                attempt(failures, "flux", () -> line.massFluxEstimate(x, t), p, x, a, t);
                                attempt(failures, "flux", () -> patch.massFluxEstimate(x, t), p, x, a, t);
                            }
                        }
                    }
                }
            }
        }
        assertEquals(List.of(), failures.subList(0, Math.min(20, failures.size())),
            failures.size() + " of " + n + " combinations not finite");
    }

    /** A computation that may throw. */
    @FunctionalInterface
    private interface Evaluation {
        Object run();
    }

    private static void attempt(List<String> failures, String what, Evaluation f,
                                TransportParameters p, double x, double y, double t) {
        final Object r;
        try {
            r = f.run();
        } catch (RuntimeException e) {
            failures.add(what + " threw " + e + " at x=" + x + " y=" + y + " t=" + t + " " + p);
            return;
        }
        if (r instanceof Estimate) {
            check(failures, what, (Estimate) r, p, x, y, t);
        } else {
            check(failures, what, (Double) r, p, x, y, t);
        }
    }

    private static void check(List<String> failures, String what, Estimate e,
                              TransportParameters p, double x, double y, double t) {
        check(failures, what.equals("flux") ? what : what + " value", e.value(), p, x, y, t);
        // (a flux's error bound is ≥ 0 even though the flux itself may be negative)
        check(failures, what.equals("flux") ? "flux error" : what + " error", e.error(), p, x, y, t);
    }

    private static void check(List<String> failures, String what, double value,
                              TransportParameters p, double x, double y, double t) {
        // concentrations and bounds are ≥ 0 for a positive rate; a flux may point upstream
        if (!Double.isFinite(value) || (value < 0 && !what.equals("flux"))) {
            failures.add(what + " = " + value + " at x=" + x + " y=" + y + " t=" + t + " " + p);
        }
    }
}
