package org.advecta.plume;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.advecta.quadrature.Estimate;
import org.advecta.transport.TransportParameters;

/**
 * Invariants of the mass flux through a plane x = X by quadrature in time
 * ({@code massFluxEstimate}): agreement with the closed form without absorbing walls, the
 * ordering 0 ≤ absorbing ≤ free, the limits far from and close to an absorbing wall, and a
 * tiny patch equal to a point.
 */
class PlumeWallFluxProperties {

    private static TransportParameters params(double v, double logDL, double ratioT,
                                              double ratioV, double r, double mu) {
        final double dl = Math.pow(10, logDL);
        return TransportParameters.of(v, dl).withDispersion(dl, dl * ratioT, dl * ratioV)
            .withRetardation(r).withDecay(mu);
    }

    /** A time between 0.1 and 10 times the advective (or diffusive) arrival at the plane. */
    private static double time(TransportParameters p, double plane, double timeFactor) {
        final double arrival = p.velocity() != 0
            ? p.retardation() * Math.abs(plane) / Math.abs(p.velocity())
            : p.retardation() * plane * plane / p.dispersion();
        return arrival * timeFactor;
    }

    @Property(tries = 150)
    void withoutAbsorbingWallsTheQuadratureEqualsTheClosedForm(
            @ForAll @DoubleRange(min = -3, max = 3) double v,
            @ForAll @DoubleRange(min = -2, max = 0.5) double logDL,
            @ForAll @DoubleRange(min = 0.01, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 1, max = 5) double r,
            @ForAll @DoubleRange(min = 0, max = 0.5) double mu,
            @ForAll @DoubleRange(min = -5, max = 5) double plane,
            @ForAll @DoubleRange(min = 0.1, max = 10) double timeFactor) {
        if (plane == 0) {
            return;
        }
        final TransportParameters p = params(v, logDL, ratioT, ratioT, r, mu);
        final double t = time(p, plane, timeFactor);
        final PointSource3D s = PointSource3D.of(p, 0, 0, 0, 1.0)
            .withWall(Wall.reflecting(Wall.Axis.Y, -0.3));
        final Estimate e = s.massFluxEstimate(plane, t);
        final double closed = s.massFlux(plane, t);
        // the closed form is within max(16, 2κ) ULP; 64 ULP covers κ ≤ 32 here
        assertEquals(closed, e.value(), e.error() + 64 * Math.ulp(closed) + Double.MIN_VALUE,
            "quadrature " + e + " vs closed form " + closed);
        if (v != 0 || mu != 0) {
            final Estimate st = s.steadyMassFluxEstimate(plane);
            final double closedSteady = s.steadyMassFlux(plane);
            assertEquals(closedSteady, st.value(),
                st.error() + 64 * Math.ulp(closedSteady) + Double.MIN_VALUE);
        }
    }

    @Property(tries = 150)
    void absorbingFluxLiesBetweenZeroAndTheFreeFlux(
            @ForAll @DoubleRange(min = 0, max = 3) double v,
            @ForAll @DoubleRange(min = -2, max = 0.5) double logDL,
            @ForAll @DoubleRange(min = 0.01, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 0.01, max = 1) double ratioV,
            @ForAll @DoubleRange(min = 1, max = 5) double r,
            @ForAll @DoubleRange(min = 0, max = 0.5) double mu,
            @ForAll @DoubleRange(min = 0.01, max = 5) double plane,
            @ForAll @DoubleRange(min = 0.1, max = 10) double timeFactor,
            @ForAll @DoubleRange(min = 0.01, max = 3) double distance) {
        // downstream of the source with v ≥ 0 the flux density R Δx + vτ is positive
        final TransportParameters p = params(v, logDL, ratioT, ratioV, r, mu);
        final double t = time(p, plane, timeFactor);
        final PointSource3D free = PointSource3D.of(p, 0, 0, 0, 1.0);
        final double f = free.massFlux(plane, t);
        final Estimate one = free.withWall(Wall.absorbing(Wall.Axis.Y, -distance))
            .massFluxEstimate(plane, t);
        final Estimate two = free.withWall(Wall.absorbing(Wall.Axis.Y, -distance))
            .withWall(Wall.absorbing(Wall.Axis.Z, distance)).massFluxEstimate(plane, t);
        assertTrue(one.value() >= -one.error(), "absorbing flux ≥ 0: " + one);
        assertTrue(one.value() <= f + one.error() + 16 * Math.ulp(f), one + " ≤ " + f);
        assertTrue(two.value() >= -two.error(), "two walls ≥ 0: " + two);
        assertTrue(two.value() <= one.value() + one.error() + two.error(),
            "a second absorbing wall removes more: " + two + " ≤ " + one);
        final LineSource2D line = LineSource2D.of(p, 0, 0, 1.0);
        final Estimate lineOne = line.withWall(Wall.absorbing(Wall.Axis.Y, -distance))
            .massFluxEstimate(plane, t);
        // the line's cross-section is the point's with the z direction integrated out
        assertEquals(one.value(), lineOne.value(), one.error() + lineOne.error());
    }

    @Property(tries = 100)
    void absorbingFluxTendsToTheFreeFluxFarFromTheWallAndToZeroOnIt(
            @ForAll @DoubleRange(min = 0.1, max = 3) double v,
            @ForAll @DoubleRange(min = -1, max = 0.5) double logDL,
            @ForAll @DoubleRange(min = 0.05, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 1, max = 3) double r,
            @ForAll @DoubleRange(min = 0, max = 0.2) double mu,
            @ForAll @DoubleRange(min = 0.1, max = 5) double plane,
            @ForAll @DoubleRange(min = 0.5, max = 10) double timeFactor) {
        final TransportParameters p = params(v, logDL, ratioT, ratioT, r, mu);
        final double t = time(p, plane, timeFactor);
        final PointSource3D free = PointSource3D.of(p, 0, 0, 0, 1.0);
        final double f = free.massFlux(plane, t);
        // far: erf(a/√(4 D_T t/R)) = 1 in double for a ≥ 6√(4 D_T t/R)
        final double sigmaMax = Math.sqrt(4 * p.transverseDispersion() * t / p.retardation());
        final Estimate far = free.withWall(Wall.absorbing(Wall.Axis.Y, -7 * sigmaMax))
            .massFluxEstimate(plane, t);
        assertEquals(f, far.value(), far.error() + 64 * Math.ulp(f), "far from the wall");
        // near: the flux falls with the distance, like erf(a/σ) ≤ 2a/(√π σ)
        double previous = f * (1 + 1e-12);
        for (double a = 1; a >= 1e-11; a *= 0.01) {
            final Estimate e = free.withWall(Wall.absorbing(Wall.Axis.Y, -a * sigmaMax))
                .massFluxEstimate(plane, t);
            assertTrue(e.value() <= previous + e.error(),
                "decreasing towards the wall: " + e + " at a/σ = " + a + ", before " + previous);
            previous = e.value();
        }
        assertTrue(previous <= 1e-5 * f, "near the wall (a/σ = 1e-10): " + previous + " of " + f);
    }

    @Property(tries = 60)
    void aTinyPatchBesideAnAbsorbingWallCarriesThePointSourceFlux(
            @ForAll @DoubleRange(min = 0.1, max = 3) double v,
            @ForAll @DoubleRange(min = -1, max = 0.5) double logDL,
            @ForAll @DoubleRange(min = 0.05, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 0, max = 0.2) double mu,
            @ForAll @DoubleRange(min = 0.1, max = 5) double plane,
            @ForAll @DoubleRange(min = 0.5, max = 10) double timeFactor,
            @ForAll @DoubleRange(min = 0.01, max = 2) double distance) {
        final TransportParameters p = params(v, logDL, ratioT, ratioT, 1.0, mu);
        final double t = time(p, plane, timeFactor);
        final Wall wy = Wall.absorbing(Wall.Axis.Y, -distance);
        final Wall wz = Wall.absorbing(Wall.Axis.Z, distance);
        final Estimate point = PointSource3D.of(p, 0, 0, 0, 1.0).withWall(wy).withWall(wz)
            .massFluxEstimate(plane, t);
        final double h = 1e-6 * distance;
        final Estimate patch = PatchSource3D.of(p, 0, 0, h, -h, 0, 1.0).withWall(wy).withWall(wz)
            .massFluxEstimate(plane, t);
        // the mean of erf over a width h differs from erf at one end by at most h·max erf'
        assertEquals(point.value(), patch.value(), 1e-5 * Math.abs(point.value())
            + point.error() + patch.error());
        // and a wide patch (u₂ − u₁ > 1 at early times) stays between its ends' point fluxes
        final Estimate wide = PatchSource3D.of(p, 0, 0, 2 * distance, -1, 1, 1.0).withWall(wy)
            .massFluxEstimate(plane, t);
        final Estimate near = PointSource3D.of(p, 0, 0, 0, 1.0).withWall(wy)
            .massFluxEstimate(plane, t);
        final Estimate farEnd = PointSource3D.of(p, 0, 2 * distance, 0, 1.0).withWall(wy)
            .massFluxEstimate(plane, t);
        assertTrue(wide.value() >= near.value() - wide.error() - near.error()
            && wide.value() <= farEnd.value() + wide.error() + farEnd.error(),
            near + " ≤ " + wide + " ≤ " + farEnd);
    }
}
