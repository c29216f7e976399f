package org.advecta.verify;

import org.advecta.solution.Solution1D;
import org.advecta.transport.TransportParameters;

/**
 * A small finite-volume solver of {@code R ∂c/∂t = D ∂²c/∂x² − v ∂c/∂x − μ c} on [x_L, x_R]:
 * the worked client of the verification package (a simulator that a user would verify).
 * It holds cell averages uᵢ on a uniform grid, updates them by the flux balance
 * <pre>
 * R·duᵢ/dt = −(F_{i+½} − F_{i−½})/h − μ·uᵢ,   F_{i+½} = v·u_{i+½} − D·(u_{i+1} − uᵢ)/h
 * </pre>
 * and takes the two ghost cells outside the domain from the exact solution's cell averages
 * (Dirichlet data in finite-volume form). Two schemes:
 * <ul>
 *   <li>{@link Scheme#UPWIND_EXPLICIT}: u_{i+½} = uᵢ (v &gt; 0), forward Euler with
 *       Δt = 0.05·R·h/|v| (a fixed ratio Δt/h, so that the time error, −vΔt/(2R)·∂²c/∂x²,
 *       stays a fixed fraction of the upwind error vh/2·∂²c/∂x²; it must also be below the
 *       stability limit R·h²/(2D + |v|h), which is checked): first order in h;</li>
 *   <li>{@link Scheme#CENTRAL_CRANK_NICOLSON}: u_{i+½} = (uᵢ + u_{i+1})/2, the trapezoidal
 *       rule in time with Δt = ½·R·h/|v|, a tridiagonal solve per step: second order in h
 *       and Δt.</li>
 * </ul>
 * The standard textbook schemes (e.g. LeVeque 2002, <i>Finite Volume Methods for Hyperbolic
 * Problems</i>, ch. 4; Hundsdorfer &amp; Verwer 2003, ch. I). Test code only.
 */
final class FiniteVolumeClient {

    /** The discretisation. */
    enum Scheme {
        /** First-order upwind, explicit Euler. */
        UPWIND_EXPLICIT,
        /** Second-order central fluxes, Crank–Nicolson. */
        CENTRAL_CRANK_NICOLSON
    }

    /** Courant number v·Δt/(R·h) of the explicit upwind scheme. */
    private static final double UPWIND_COURANT = 0.05;
    /** Courant number of the Crank–Nicolson scheme. */
    private static final double CN_COURANT = 0.5;

    private FiniteVolumeClient() {
    }

    /**
     * Solves from t = 0 (initial cell averages of the exact solution) to tEnd.
     *
     * @param exact the exact solution (initial and ghost-cell data)
     * @param scheme the scheme
     * @param xLeft left end
     * @param xRight right end
     * @param cells number of cells
     * @param tEnd final time
     * @return the cell averages at tEnd
     */
    static double[] solve(Solution1D exact, Scheme scheme, double xLeft, double xRight,
                          int cells, double tEnd) {
        final TransportParameters p = exact.parameters();
        final double v = p.velocity();
        final double d = p.dispersion();
        final double r = p.retardation();
        final double mu = p.decayRate();
        final double h = (xRight - xLeft) / cells;
        final double[] faces = new double[cells + 3];
        for (int i = 0; i < faces.length; i++) {
            faces[i] = xLeft + (i - 1) * h;
        }
        // u[0] and u[cells + 1] are the ghost cells
        final double[] u = new double[cells + 2];
        CellAverages.averages(exact, faces, 0.0, u);
        final double courant = scheme == Scheme.UPWIND_EXPLICIT ? UPWIND_COURANT : CN_COURANT;
        final int steps = (int) Math.ceil(tEnd / (courant * r * h / Math.abs(v)));
        final double dt = tEnd / steps;
        if (scheme == Scheme.UPWIND_EXPLICIT && !(dt <= r * h * h / (2 * d + Math.abs(v) * h))) {
            throw new IllegalArgumentException("explicit step unstable on " + cells + " cells");
        }
        final double[] next = new double[cells + 2];
        final double[] ghostFaces = {faces[0], faces[1], faces[cells + 1], faces[cells + 2]};
        final double[] ghosts = new double[3];
        for (int n = 0; n < steps; n++) {
            final double tNext = (n + 1) * dt;
            CellAverages.averages(exact, ghostFaces, tNext, ghosts);
            if (scheme == Scheme.UPWIND_EXPLICIT) {
                upwindStep(u, next, v, d, r, mu, h, dt);
            } else {
                crankNicolsonStep(u, next, v, d, r, mu, h, dt, ghosts[0], ghosts[2]);
            }
            next[0] = ghosts[0];
            next[cells + 1] = ghosts[2];
            System.arraycopy(next, 0, u, 0, u.length);
        }
        final double[] out = new double[cells];
        System.arraycopy(u, 1, out, 0, cells);
        return out;
    }

    private static void upwindStep(double[] u, double[] next, double v, double d, double r,
                                   double mu, double h, double dt) {
        final int m = u.length - 1;
        for (int i = 1; i < m; i++) {
            final double fr = v * (v > 0 ? u[i] : u[i + 1]) - d * (u[i + 1] - u[i]) / h;
            final double fl = v * (v > 0 ? u[i - 1] : u[i]) - d * (u[i] - u[i - 1]) / h;
            next[i] = u[i] + dt / r * (-(fr - fl) / h - mu * u[i]);
        }
    }

    /**
     * (R/Δt)·(u' − u) = ½[A u + A u'], with (A u)ᵢ = a·u_{i−1} + b·uᵢ + c·u_{i+1}:
     * a = v/(2h) + D/h², b = −2D/h² − μ, c = −v/(2h) + D/h².
     */
    private static void crankNicolsonStep(double[] u, double[] next, double v, double d,
                                          double r, double mu, double h, double dt,
                                          double leftGhost, double rightGhost) {
        final int n = u.length - 2;
        final double a = v / (2 * h) + d / (h * h);
        final double b = -2 * d / (h * h) - mu;
        final double c = -v / (2 * h) + d / (h * h);
        final double k = r / dt;
        final double[] sub = new double[n];
        final double[] diag = new double[n];
        final double[] sup = new double[n];
        final double[] rhs = new double[n];
        for (int j = 0; j < n; j++) {
            final int i = j + 1;
            sub[j] = -0.5 * a;
            diag[j] = k - 0.5 * b;
            sup[j] = -0.5 * c;
            rhs[j] = k * u[i] + 0.5 * (a * u[i - 1] + b * u[i] + c * u[i + 1]);
        }
        rhs[0] += 0.5 * a * leftGhost;
        rhs[n - 1] += 0.5 * c * rightGhost;
        // Thomas algorithm
        for (int j = 1; j < n; j++) {
            final double w = sub[j] / diag[j - 1];
            diag[j] -= w * sup[j - 1];
            rhs[j] -= w * rhs[j - 1];
        }
        next[n] = rhs[n - 1] / diag[n - 1];
        for (int j = n - 2; j >= 0; j--) {
            next[j + 1] = (rhs[j] - sup[j] * next[j + 2]) / diag[j];
        }
    }
}
