package org.advecta.plume;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.advecta.kernel.FreeSpaceKernel3D;
import org.advecta.quadrature.Estimate;
import org.advecta.testing.Integrals;
import org.advecta.transport.TransportParameters;

/**
 * Invariants of the continuous sources: the approach to steady state, mass flux at steady
 * state, superposition, symmetry, positivity, walls, and consistency between the closed forms
 * and the quadratures (each path checks the other).
 */
class PlumeProperties {

    private static TransportParameters params(double v, double logDL, double ratioT,
                                              double ratioV, double r, double mu) {
        final double dl = Math.pow(10, logDL);
        return TransportParameters.of(v, dl).withDispersion(dl, dl * ratioT, dl * ratioV)
            .withRetardation(r).withDecay(mu);
    }

    @Property(tries = 200)
    void pointSourceRisesMonotonicallyToItsSteadyState(
            @ForAll @DoubleRange(min = -5, max = 5) double v,
            @ForAll @DoubleRange(min = -2, max = 0.5) double logDL,
            @ForAll @DoubleRange(min = 0.01, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 0.01, max = 1) double ratioV,
            @ForAll @DoubleRange(min = 1, max = 5) double r,
            @ForAll @DoubleRange(min = 0, max = 0.5) double mu,
            @ForAll @DoubleRange(min = -3, max = 3) double x,
            @ForAll @DoubleRange(min = -1, max = 1) double y,
            @ForAll @DoubleRange(min = -1, max = 1) double z) {
        if (x == 0 && y == 0 && z == 0) {
            return;    // the source point itself is outside the domain
        }
        final TransportParameters p = params(v, logDL, ratioT, ratioV, r, mu);
        final PointSource3D s = PointSource3D.of(p, 0, 0, 0, 1.0);
        final double steady = s.steadyValue(x, y, z);
        // late: 1e30 time units; erfc(A) → 2 with A ≈ −U t/√(4 D_L R t), or for U = 0
        // (v = μ = 0) c∞·erfc(R r/√(4 D_L R t)), whose relative distance from c∞ is about
        // r/√(π D_L t/R) ≤ 15/√(π·0.01·1e30/5) ≈ 2e−13 for the stretched distance r ≤ 15 here
        // (at 1e20 it reached 1.8e−8: a try with v = 0, D_L = 0.01, D_T = D_V = D_L/100 failed)
        final double late = s.value(x, y, z, 1e30);
        assertEquals(steady, late, 1e-9 * steady);
        double previous = 0;
        for (double t = 1e-3; t < 1e4; t *= 3) {
            final double c = s.value(x, y, z, t);
            assertTrue(c >= previous * (1 - 1e-14) && c <= steady * (1 + 1e-14),
                "c(t) rises towards c(∞): " + previous + " " + c + " " + steady + " at t = " + t);
            previous = c;
        }
    }

    @Property(tries = 60)
    void lineSourceQuadratureTendsToTheClosedFormWithK0(
            @ForAll @DoubleRange(min = 0.1, max = 20) double v,
            @ForAll @DoubleRange(min = -2, max = 0.5) double logDL,
            @ForAll @DoubleRange(min = 0.01, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 1, max = 5) double r,
            @ForAll @DoubleRange(min = 0, max = 0.5) double mu,
            @ForAll @DoubleRange(min = -3, max = 10) double x,
            @ForAll @DoubleRange(min = -2, max = 2) double y) {
        final TransportParameters p = params(v, logDL, ratioT, 1, r, mu);
        final LineSource2D s = LineSource2D.of(p, 0, 0, 1.0);
        if (x * x + y * y < 1e-6) {
            return;
        }
        // the integrand is exp(−a/τ − bτ)/τ, b = U²/(4 D_L R); the steady integral is
        // 2K₀(z) ≈ e^{−z}, z = 2√(ab), and beyond t with bt ≥ z + 60 the tail is below
        // e^{−bt} ≤ e^{−60}·e^{−z}: the quadrature must then reproduce the K0 closed form
        // within its own bound and the closed form's rounding (two independent routes)
        final double dl = p.dispersion();
        final double u2 = v * v + 4 * mu * dl;
        final double b = u2 / (4 * dl * r);
        final double z = Math.sqrt(x * x + y * y / ratioT) * Math.sqrt(u2) / (2 * dl);
        final double t = (z + 60) / b;
        final Estimate e = s.estimate(x, y, t);
        final double steady = s.steadyValue(x, y);
        // the closed form within max(16, 2κ) ULP, κ ≲ 2z + 2
        assertEquals(steady, e.value(), e.error() + Math.max(16, 4 * z + 4) * Math.ulp(steady));
        assertTrue(e.relativeError() <= 1e-10, "bound " + e);
    }

    @Property(tries = 40)
    void patchSourceTendsToItsSteadyState(
            @ForAll @DoubleRange(min = 0.2, max = 5) double v,
            @ForAll @DoubleRange(min = -1.5, max = 0) double logDL,
            @ForAll @DoubleRange(min = 0.05, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 0.05, max = 1) double ratioV,
            @ForAll @DoubleRange(min = 1, max = 3) double r,
            @ForAll @DoubleRange(min = 0, max = 0.2) double mu,
            @ForAll @DoubleRange(min = -1, max = 5) double x,
            @ForAll @DoubleRange(min = -2, max = 2) double y,
            @ForAll @DoubleRange(min = -1, max = 1) double z) {
        final TransportParameters p = params(v, logDL, ratioT, ratioV, r, mu);
        final PatchSource3D s = PatchSource3D.of(p, 0, -0.5, 1, -0.25, 0.25, 1.0);
        // late enough that the tail beyond t, below e^{−bt}, is e^{−60} of the steady value
        // ≈ e^{−z}, z = U·(stretched distance to the patch's far corner)/(2 D_L) at most
        final double dl = p.dispersion();
        final double u2 = v * v + 4 * mu * dl;
        final double b = u2 / (4 * dl * r);
        final double far = Math.sqrt(x * x + (Math.abs(y) + 1) * (Math.abs(y) + 1) / ratioT
            + (Math.abs(z) + 1) * (Math.abs(z) + 1) / ratioV);
        final double t = (far * Math.sqrt(u2) / (2 * dl) + 60) / b;
        final Estimate late = s.estimate(x, y, z, t);
        final Estimate steady = s.steadyEstimate(x, y, z);
        assertEquals(steady.value(), late.value(),
            steady.error() + late.error() + 1e-14 * steady.value());
        assertTrue(late.relativeError() <= 1e-10 && steady.relativeError() <= 1e-10,
            late + " " + steady);
    }

    @Property(tries = 300)
    void steadyMassFluxDownstreamEqualsTheRateWithoutDecay(
            @ForAll @DoubleRange(min = 0.01, max = 100) double v,
            @ForAll @DoubleRange(min = -3, max = 1) double logDL,
            @ForAll @DoubleRange(min = 1, max = 5) double r,
            @ForAll @DoubleRange(min = -3, max = 3) double logX,
            @ForAll @DoubleRange(min = -1e3, max = 1e3) double rate) {
        final TransportParameters p = params(v, logDL, 0.1, 0.01, r, 0);
        final double xPlane = Math.pow(10, logX);
        final PointSource3D s = PointSource3D.of(p, 0, 0, 0, rate);
        // exact: F = q (1 + v/U)/2 · e^{−X(U − v)/(2D_L)} = q for μ = 0 (U = v)
        assertEquals(rate, s.steadyMassFlux(xPlane), 2 * Math.ulp(rate));
        assertTrue(s.steadyMassFlux(-xPlane) == 0, "nothing crosses upstream at steady state");
        assertEquals(rate, LineSource2D.of(p, 0, 0, rate).steadyMassFlux(xPlane),
            2 * Math.ulp(rate));
        // and the finite-time flux approaches it
        assertEquals(rate, s.massFlux(xPlane, 1e6 * r * xPlane / v + 1e3 * r / v / v
            * p.dispersion()), 1e-12 * Math.abs(rate));
    }

    @Property(tries = 300)
    void steadyMassFluxDecaysWithTheTravelTime(
            @ForAll @DoubleRange(min = 0.1, max = 100) double v,
            @ForAll @DoubleRange(min = -4, max = -1) double logDL,
            @ForAll @DoubleRange(min = 1, max = 5) double r,
            @ForAll @DoubleRange(min = 0, max = 1) double mu,
            @ForAll @DoubleRange(min = -3, max = 1) double logX) {
        final TransportParameters p = params(v, logDL, 0.1, 0.01, r, mu);
        final double xPlane = Math.pow(10, logX);
        final PatchSource3D s = PatchSource3D.of(p, 0, -1, 1, -1, 1, 1.0);
        // advection only: q·exp(−μ·(R X/v)/R), the decay over the travel time R X/v of the
        // retarded solute (whose decay rate is μ/R). With ε = μ D_L/v², the exact
        // q(1 + v/U)/2·exp(−X(U − v)/(2 D_L)) differs from it by about ε(1 + μX/v) relative.
        final double eps = mu * p.dispersion() / (v * v);
        if (eps > 1e-3) {
            return;
        }
        final double advective = Math.exp(-mu * xPlane / v);
        final double f = s.steadyMassFlux(xPlane);
        assertEquals(advective, f, (2 * eps * (1 + mu * xPlane / v) + 1e-15) * advective);
    }

    @Property(tries = 40)
    void steadyMassFluxIsTheIntegralOfTheConcentrationFlux(
            @ForAll @DoubleRange(min = 0.2, max = 3) double v,
            @ForAll @DoubleRange(min = -1, max = 0) double logDL,
            @ForAll @DoubleRange(min = 0.1, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 1, max = 3) double r,
            @ForAll @DoubleRange(min = 0, max = 0.5) double mu,
            @ForAll @DoubleRange(min = 0.5, max = 4) double xPlane) {
        // ∫ (v c − D_L ∂c/∂x) dy of the K0 closed form (trapezoid in y, central difference
        // in x with step h: error ~h² c'''), against the closed-form flux of the 1-D reduction
        final TransportParameters p = params(v, logDL, ratioT, 1, r, mu);
        final LineSource2D s = LineSource2D.of(p, 0, 0, 1.0);
        final double dl = p.dispersion();
        final double h = 1e-4;
        // far off the axis c decays like exp(−|y|·U/(2√(D_L D_T))): cut where that is e^-45
        final double u = Math.sqrt(v * v + 4 * mu * dl);
        final double width = Math.max(40 * Math.sqrt(p.transverseDispersion() * (xPlane + 1) / v),
            90 * Math.sqrt(dl * p.transverseDispersion()) / u);
        final double integral = Integrals.trapezoid(y -> v * s.steadyValue(xPlane, y)
                - dl * (s.steadyValue(xPlane + h, y) - s.steadyValue(xPlane - h, y)) / (2 * h),
            -width, width, 40000);
        final double f = s.steadyMassFlux(xPlane);
        assertEquals(f, integral, 1e-6 * f);
    }

    @Property(tries = 60)
    void patchIsTheSumOfItsParts(
            @ForAll @DoubleRange(min = -5, max = 5) double v,
            @ForAll @DoubleRange(min = -1.5, max = 0) double logDL,
            @ForAll @DoubleRange(min = 0.05, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 1, max = 3) double r,
            @ForAll @DoubleRange(min = 0, max = 0.2) double mu,
            @ForAll @DoubleRange(min = -2, max = 4) double x,
            @ForAll @DoubleRange(min = -2, max = 2) double y,
            @ForAll @DoubleRange(min = -1, max = 1) double z,
            @ForAll @DoubleRange(min = 0.01, max = 10) double t,
            @ForAll @DoubleRange(min = -0.9, max = 0.9) double split) {
        // superposition: the rectangle [−1, 1]×[−0.5, 0.5] of rate 2 is the sum of
        // [−1, split] and [split, 1], each with rate proportional to its area
        final TransportParameters p = params(v, logDL, ratioT, 0.5, r, mu);
        final Estimate whole = PatchSource3D.of(p, 0, -1, 1, -0.5, 0.5, 2.0)
            .estimate(x, y, z, t);
        final Estimate left = PatchSource3D.of(p, 0, -1, split, -0.5, 0.5, split + 1)
            .estimate(x, y, z, t);
        final Estimate right = PatchSource3D.of(p, 0, split, 1, -0.5, 0.5, 1 - split)
            .estimate(x, y, z, t);
        assertEquals(whole.value(), left.value() + right.value(),
            whole.error() + left.error() + right.error() + 1e-14 * whole.value()
                + 4 * Double.MIN_VALUE);
    }

    @Property(tries = 60)
    void smallPatchIsAPointSource(
            @ForAll @DoubleRange(min = -5, max = 5) double v,
            @ForAll @DoubleRange(min = -1, max = 0) double logDL,
            @ForAll @DoubleRange(min = 0.1, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 0.1, max = 1) double ratioV,
            @ForAll @DoubleRange(min = 1, max = 3) double r,
            @ForAll @DoubleRange(min = 0, max = 0.2) double mu,
            @ForAll @DoubleRange(min = 1, max = 3) double x,
            @ForAll @DoubleRange(min = -1, max = 1) double y,
            @ForAll @DoubleRange(min = 0.1, max = 10) double t) {
        // a patch of half-width h around the origin differs from the point source by O(h²)
        // (the second moments of the square; the quadrature and the closed form meet)
        final TransportParameters p = params(v, logDL, ratioT, ratioV, r, mu);
        final double h = 1e-5;
        final double point = PointSource3D.of(p, 0, 0, 0, 1.0).value(x, y, 0.3, t);
        final Estimate patch = PatchSource3D.of(p, 0, -h, h, -h, h, 1.0).estimate(x, y, 0.3, t);
        if (point < 1e-200) {
            return;
        }
        // relative O(h²·(ξ/σ²)²) with ξ/σ² below about 300 here: under 1e-5
        assertEquals(point, patch.value(), 1e-5 * point + patch.error());
    }

    @Property(tries = 100)
    void duhamelPulseIsTheTimeIntegralOfTheKernel(
            @ForAll @DoubleRange(min = -3, max = 3) double v,
            @ForAll @DoubleRange(min = -1, max = 0) double logDL,
            @ForAll @DoubleRange(min = 0.1, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 1, max = 3) double r,
            @ForAll @DoubleRange(min = 0, max = 0.3) double mu,
            @ForAll @DoubleRange(min = -2, max = 4) double x,
            @ForAll @DoubleRange(min = 0.1, max = 2) double y,
            @ForAll @DoubleRange(min = 0.5, max = 3) double duration,
            @ForAll @DoubleRange(min = 0.1, max = 5) double after) {
        // rate 1 on [1, 1 + duration], 0 after: c(t) = (1/R)∫ G(t − s) ds over the pulse,
        // the free-space kernel integrated by the trapezoid rule (smooth in s, since the
        // point is away from the source)
        final TransportParameters p = params(v, logDL, ratioT, 0.5, r, mu);
        final RateHistory pulse = RateHistory.of(new double[] {1, 1 + duration},
            new double[] {1, 0});
        final double t = 1 + duration + after;
        final double c = PointSource3D.of(p, 0, 0, 0, 1).withRateHistory(pulse)
            .value(x, y, 0.1, t);
        final FreeSpaceKernel3D g = FreeSpaceKernel3D.of(p, 0, 0, 0);
        final double direct = Integrals.trapezoid(s -> g.value(x, y, 0.1, t - s), 1,
            1 + duration, 20000) / r;
        // the trapezoid's own error, by halving the step (it is about a third of the change)
        final double coarse = Integrals.trapezoid(s -> g.value(x, y, 0.1, t - s), 1,
            1 + duration, 10000) / r;
        // the superposition c₁(t − 1) − c₁(t − 1 − duration) cancels once the pulse has
        // passed: its error is rounding of the larger term (RateHistory's javadoc)
        final double term = PointSource3D.of(p, 0, 0, 0, 1).value(x, y, 0.1, t - 1);
        assertEquals(direct, c, Math.abs(direct - coarse) + 1e-12 * direct
            + 8 * Math.ulp(term) + 1e-300);
    }

    @Property(tries = 200)
    void symmetricInYAndZAndPositive(
            @ForAll @DoubleRange(min = -5, max = 5) double v,
            @ForAll @DoubleRange(min = -2, max = 0.5) double logDL,
            @ForAll @DoubleRange(min = 0.01, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 0.01, max = 1) double ratioV,
            @ForAll @DoubleRange(min = 1, max = 5) double r,
            @ForAll @DoubleRange(min = 0, max = 0.5) double mu,
            @ForAll @DoubleRange(min = -3, max = 3) double x,
            @ForAll @DoubleRange(min = 0.01, max = 2) double dy,
            @ForAll @DoubleRange(min = 0.01, max = 2) double dz,
            @ForAll @DoubleRange(min = -3, max = 2) double logT) {
        final TransportParameters p = params(v, logDL, ratioT, ratioV, r, mu);
        final double t = Math.pow(10, logT);
        // a source on the axes, so that ±dy and ±dz are exact mirror images
        final double y0 = 0;
        final double z0 = 0;
        final PointSource3D point = PointSource3D.of(p, 0.5, y0, z0, 1);
        final double c = point.value(x, y0 + dy, z0 + dz, t);
        assertTrue(c >= 0 && Double.isFinite(c), "positive: " + c);
        assertEquals(c, point.value(x, y0 - dy, z0 + dz, t));
        assertEquals(c, point.value(x, y0 + dy, z0 - dz, t));
        final LineSource2D line = LineSource2D.of(p, 0.5, y0, 1);
        final double cl = line.value(x, y0 + dy, t);
        assertTrue(cl >= 0 && Double.isFinite(cl), "positive: " + cl);
        assertEquals(cl, line.value(x, y0 - dy, t));
        final PatchSource3D patch = PatchSource3D.of(p, 0.5, y0 - 1, y0 + 1, z0 - 0.5, z0 + 0.5, 1);
        final double cp = patch.value(x, y0 + dy, z0 + dz, t);
        assertTrue(cp >= 0 && Double.isFinite(cp), "positive: " + cp);
        assertEquals(cp, patch.value(x, y0 - dy, z0 + dz, t), 1e-13 * cp);
        assertEquals(cp, patch.value(x, y0 + dy, z0 - dz, t), 1e-13 * cp);
    }

    @Property(tries = 100)
    void wallsReflectOrAbsorb(
            @ForAll @DoubleRange(min = -5, max = 5) double v,
            @ForAll @DoubleRange(min = -2, max = 0.5) double logDL,
            @ForAll @DoubleRange(min = 0.01, max = 1) double ratioT,
            @ForAll @DoubleRange(min = 1, max = 5) double r,
            @ForAll @DoubleRange(min = 0, max = 0.5) double mu,
            @ForAll @DoubleRange(min = -3, max = 3) double x,
            @ForAll @DoubleRange(min = 0.05, max = 2) double sourceToWall,
            @ForAll @DoubleRange(min = 0.01, max = 100) double t) {
        final TransportParameters p = params(v, logDL, ratioT, 0.5, r, mu);
        final double wall = -1;
        final PointSource3D free = PointSource3D.of(p, 0, wall + sourceToWall, 0, 1);
        final PointSource3D reflecting = free.withWall(Wall.reflecting(Wall.Axis.Y, wall));
        final PointSource3D absorbing = free.withWall(Wall.absorbing(Wall.Axis.Y, wall));
        // absorbing: zero on the wall; reflecting: no gradient across it (the central
        // difference of the doubled field cancels to rounding), and it keeps the mass
        // flux of the free source (the image adds what leaves through the wall)
        assertEquals(0.0, absorbing.value(x, wall, 0.2, t));
        final double h = 1e-3;
        final double up = reflecting.value(x, wall + h, 0.2, t);
        final double c = reflecting.value(x, wall, 0.2, t);
        assertEquals(2 * free.value(x, wall, 0.2, t), c, 4 * Math.ulp(c));
        assertTrue(up >= 0 && c >= 0);
        final double freeC = free.value(x, wall + h, 0.2, t);
        assertTrue(absorbing.value(x, wall + h, 0.2, t) <= freeC
            && reflecting.value(x, wall + h, 0.2, t) >= freeC);
        if (x != 0) {
            assertEquals(free.massFlux(x, t), reflecting.massFlux(x, t));
        }
    }
}
