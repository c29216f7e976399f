package org.advecta.cli;

import java.util.stream.Stream;
import org.advecta.halfspace.HalfLineSlug;
import org.advecta.halfspace.HalfLineStep;
import org.advecta.halfspace.HalfSpaceKernel1D;
import org.advecta.halfspace.HalfSpaceKernel2D;
import org.advecta.halfspace.HalfSpaceKernel3D;
import org.advecta.halfspace.Wall;
import org.advecta.halfspace.WallAxis;
import org.advecta.solution.Solution1D;
import org.advecta.transport.TransportParameters;

/**
 * {@link EvalCommandTest}'s bit-for-bit cases of the half-space families: the library's own
 * value, gradient and flux, called directly. The shared points have x ≥ 0 but y and z of both
 * signs, so the 2D and 3D cases here have their wall at x = 0 (axis = x); walls y = 0 and
 * z = 0 are compared in {@link HalfSpaceCliTest}.
 */
final class HalfSpaceCases {

    private HalfSpaceCases() {
    }

    private static TransportParameters tp(double v, double d, double r, double mu) {
        return TransportParameters.of(v, d).withRetardation(r).withDecay(mu);
    }

    private static EvalCommandTest.Reference line(Solution1D s) {
        return (x, y, z, t) -> new double[] {s.value(x, t), s.gradient(x, t), s.flux(x, t)};
    }

    static Stream<EvalCommandTest.Case> cases() {
        final HalfSpaceKernel1D k1a = HalfSpaceKernel1D.of(tp(-0.5, 0.1, 1.3, 0.02),
            Wall.ABSORBING, 1.0);
        final HalfSpaceKernel1D k1z = HalfSpaceKernel1D.of(tp(0.5, 0.1, 1, 0), Wall.ZERO_FLUX,
            0.35);
        final HalfSpaceKernel2D k2 = HalfSpaceKernel2D.of(tp(0.25, 0.5, 1.0, 0.0)
            .withDispersion(0.5, 0.05, 0.05), Wall.ZERO_FLUX, WallAxis.X, 1.0, -1.0);
        final HalfSpaceKernel2D k2a = HalfSpaceKernel2D.of(tp(-0.25, 0.5, 1.5, 0.01)
            .withDispersion(0.5, 0.05, 0.05), Wall.ABSORBING, WallAxis.X, 0.2, 0.4);
        final HalfSpaceKernel3D k3 = HalfSpaceKernel3D.of(tp(0.4, 0.2, 2.0, 1e-3)
            .withDispersion(0.2, 0.02, 0.004), Wall.ABSORBING, WallAxis.X, 0.5, 0.25, -0.5);
        return Stream.of(
            new EvalCommandTest.Case("release-wall-1d", 1, true, (x, y, z, t) -> new double[] {
                3.0 * k1a.value(x, t), 3.0 * k1a.gradient(x, t), 3.0 * k1a.flux(x, t)},
                "v=-0.5", "D=0.1", "R=1.3", "mu=0.02", "wall=absorbing", "x0=1", "M=3"),
            new EvalCommandTest.Case("release-wall-1d", 1, true, (x, y, z, t) -> new double[] {
                k1z.value(x, t), k1z.gradient(x, t), k1z.flux(x, t)},
                "v=0.5", "D=0.1", "wall=zero-flux", "x0=0.35"),
            new EvalCommandTest.Case("release-wall-2d", 2, true, (x, y, z, t) -> new double[] {
                4.0 * k2.value(x, y, t), 4.0 * k2.gradientX(x, y, t),
                4.0 * k2.gradientY(x, y, t), 4.0 * k2.fluxX(x, y, t), 4.0 * k2.fluxY(x, y, t)},
                "v=0.25", "D=0.5", "DT=0.05", "wall=zero-flux", "axis=x", "x0=1", "y0=-1",
                "M=4"),
            new EvalCommandTest.Case("release-wall-2d", 2, true, (x, y, z, t) -> new double[] {
                k2a.value(x, y, t), k2a.gradientX(x, y, t), k2a.gradientY(x, y, t),
                k2a.fluxX(x, y, t), k2a.fluxY(x, y, t)},
                "v=-0.25", "D=0.5", "DT=0.05", "R=1.5", "mu=0.01", "wall=absorbing", "axis=x",
                "x0=0.2", "y0=0.4"),
            new EvalCommandTest.Case("release-wall-3d", 3, true, (x, y, z, t) -> new double[] {
                k3.value(x, y, z, t), k3.gradientX(x, y, z, t), k3.gradientY(x, y, z, t),
                k3.gradientZ(x, y, z, t), k3.fluxX(x, y, z, t), k3.fluxY(x, y, z, t),
                k3.fluxZ(x, y, z, t)},
                "v=0.4", "D=0.2", "DT=0.02", "DV=0.004", "R=2", "mu=1e-3", "wall=absorbing",
                "axis=x", "x0=0.5", "y0=0.25", "z0=-0.5"),
            new EvalCommandTest.Case("step-wall", 1, true, line(HalfLineStep.of(
                tp(0.6, 5e-3, 1.5, 0.01), Wall.ABSORBING, 0.2, 3.0)),
                "v=0.6", "D=5e-3", "R=1.5", "mu=0.01", "wall=absorbing", "a=0.2", "C0=3"),
            new EvalCommandTest.Case("step-wall", 1, true, line(HalfLineStep.of(
                tp(-0.2, 0.05, 1, 0), Wall.ZERO_FLUX, 0, 1)),
                "v=-0.2", "D=0.05", "wall=zero-flux"),
            new EvalCommandTest.Case("slug-wall", 1, true, line(HalfLineSlug.of(
                tp(0.3, 0.02, 1.2, 0.05), Wall.ZERO_FLUX, 0.1, 0.5, 2.0)),
                "v=0.3", "D=0.02", "R=1.2", "mu=0.05", "wall=zero-flux", "a=0.1", "b=0.5",
                "C0=2"),
            new EvalCommandTest.Case("slug-wall", 1, true, line(HalfLineSlug.of(
                tp(-0.3, 0.02, 1, 0), Wall.ABSORBING, 0, 1, 1)),
                "v=-0.3", "D=0.02", "wall=absorbing", "b=1"));
    }
}
