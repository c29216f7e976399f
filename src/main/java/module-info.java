/**
 * Exact solutions of the advection-diffusion-reaction equation
 * {@code R ∂c/∂t = D ∂²c/∂x² − v ∂c/∂x − μ c}.
 *
 * <p>Packages, from the bottom up: {@link org.advecta.special} (error functions and the
 * overflow-free products they appear in), {@link org.advecta.transport} (the parameters of
 * the medium and flow), {@link org.advecta.kernel} (Green's functions of an instantaneous
 * release).
 */
module org.advecta {
    requires org.apache.commons.numbers.gamma;

    exports org.advecta.special;
    exports org.advecta.transport;
    exports org.advecta.kernel;
    exports org.advecta.solution;
    exports org.advecta.halfspace;
}
