package org.advecta.cli;

import java.util.stream.Stream;
import org.advecta.plume.LineSource2D;
import org.advecta.plume.PatchSource3D;
import org.advecta.plume.PointSource3D;
import org.advecta.plume.Wall;
import org.advecta.quadrature.Estimate;
import org.advecta.transport.TransportParameters;

/**
 * {@link EvalCommandTest}'s bit-for-bit cases of the continuous sources: the library's own
 * {@code value}, {@code steadyValue}, {@code estimate} and {@code steadyEstimate}, called
 * directly. Sources are placed off the test's points (x0 = 0.5 is not among them), except the
 * patch, whose plane x0 = 0.2 holds points on and off the rectangle. Steady cases keep the t
 * column, which eval passes through unread: the reference ignores t.
 */
final class PlumeCases {

    private PlumeCases() {
    }

    private static TransportParameters tp(double v, double d, double r, double mu,
                                          double dt, double dv) {
        return TransportParameters.of(v, d).withRetardation(r).withDecay(mu)
            .withDispersion(d, dt, dv);
    }

    private static double[] of(Estimate e) {
        return new double[] {e.value(), e.error()};
    }

    static Stream<EvalCommandTest.Case> cases() {
        final TransportParameters p3 = tp(0.4, 0.2, 2.0, 1e-3, 0.02, 0.004);
        final PointSource3D point = PointSource3D.of(p3, 0.5, 0.25, -0.5, 2.5);
        final PointSource3D pointSteady = PointSource3D.of(p3, 0.5, 0.25, -0.5, 2.5)
            .withWall(Wall.absorbing(Wall.Axis.Y, -2));
        final PointSource3D still = PointSource3D.of(tp(0, 0.1, 1, 0, 0.1, 0.05), 0.5, 0.25,
            -0.5, 1);
        final TransportParameters p2 = tp(0.25, 0.5, 1.5, 0.0, 0.05, 0.05);
        final LineSource2D line = LineSource2D.of(p2, 0.5, -1.0, 4.0)
            .withWall(Wall.reflecting(Wall.Axis.Y, -2));
        final LineSource2D lineSteady = LineSource2D.of(tp(-0.25, 0.5, 1.0, 0.01, 0.05, 0.05),
            0.5, 0.25, 4.0);
        final TransportParameters pp = tp(0.5, 0.1, 1.2, 0.02, 0.01, 0.005);
        final PatchSource3D patch = PatchSource3D.of(pp, 0.2, -1, 0.5, -1, 0.5, 3.0);
        final PatchSource3D patchSteady = PatchSource3D.of(pp, 0.2, -1, 0.5, -1, 1, 3.0)
            .withWall(Wall.reflecting(Wall.Axis.Z, 1));
        return Stream.of(
            EvalCommandTest.Case.values("point-source-3d", 3,
                (x, y, z, t) -> new double[] {point.value(x, y, z, t)},
                "v=0.4", "D=0.2", "DT=0.02", "DV=0.004", "R=2", "mu=1e-3", "x0=0.5", "y0=0.25",
                "z0=-0.5", "q=2.5"),
            EvalCommandTest.Case.values("point-source-3d", 3,
                (x, y, z, t) -> new double[] {pointSteady.steadyValue(x, y, z)},
                "v=0.4", "D=0.2", "DT=0.02", "DV=0.004", "R=2", "mu=1e-3", "x0=0.5", "y0=0.25",
                "z0=-0.5", "q=2.5", "steady=true", "wall=absorbing", "yw=-2"),
            EvalCommandTest.Case.values("point-source-3d", 3,
                (x, y, z, t) -> new double[] {still.steadyValue(x, y, z)},
                "v=0", "D=0.1", "DT=0.1", "DV=0.05", "x0=0.5", "y0=0.25", "z0=-0.5",
                "steady=true"),
            EvalCommandTest.Case.bounded("line-source-2d", 2,
                (x, y, z, t) -> of(line.estimate(x, y, t)),
                "v=0.25", "D=0.5", "DT=0.05", "R=1.5", "x0=0.5", "y0=-1", "q=4",
                "wall=reflecting", "yw=-2"),
            EvalCommandTest.Case.values("line-source-2d", 2,
                (x, y, z, t) -> new double[] {lineSteady.steadyValue(x, y)},
                "v=-0.25", "D=0.5", "DT=0.05", "mu=0.01", "x0=0.5", "y0=0.25", "q=4",
                "steady=true"),
            EvalCommandTest.Case.bounded("patch-source-3d", 3,
                (x, y, z, t) -> of(patch.estimate(x, y, z, t)),
                "v=0.5", "D=0.1", "DT=0.01", "DV=0.005", "R=1.2", "mu=0.02", "x0=0.2", "y1=-1",
                "y2=0.5", "z1=-1", "z2=0.5", "q=3"),
            EvalCommandTest.Case.bounded("patch-source-3d", 3,
                (x, y, z, t) -> of(patchSteady.steadyEstimate(x, y, z)),
                "v=0.5", "D=0.1", "DT=0.01", "DV=0.005", "R=1.2", "mu=0.02", "x0=0.2", "y1=-1",
                "y2=0.5", "z1=-1", "z2=1", "q=3", "steady=true", "wall=reflecting", "zw=1"));
    }
}
