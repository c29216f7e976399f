/**
 * Exact solutions of the advection-diffusion-reaction equation
 * {@code R ∂c/∂t = D ∂²c/∂x² − v ∂c/∂x − μ c}.
 *
 * <p>Packages, from the bottom up: {@link org.advecta.special} (error functions and the
 * overflow-free products they appear in), {@link org.advecta.transport} (the parameters of
 * the medium and flow), {@link org.advecta.kernel} (Green's functions of an instantaneous
 * release).
 *
 * <p>The command line (package {@code org.advecta.cli}, not exported) needs the modules
 * required {@code static} below only when it runs; they are optional Maven dependencies,
 * bundled in the runnable jar and never passed on to the library's consumers.
 */
// Commons Math 3.6.1, JFreeChart 1.5 and Batik 1.19 have no module descriptors (automatic
// modules, named from their jars); only the fitting and the command line use them.
@SuppressWarnings("requires-automatic")
module org.advecta {
    requires org.apache.commons.numbers.gamma;
    // Optional: only org.advecta.fit uses it, and checks for it at run time.
    requires static commons.math3;

    requires static info.picocli;
    requires static com.fasterxml.jackson.databind;
    requires static com.fasterxml.jackson.dataformat.toml;
    requires static org.apache.commons.csv;
    requires static org.jfree.jfreechart;
    requires static org.apache.xmlgraphics.batik.svggen;
    requires static java.desktop;
    requires static java.xml;

    exports org.advecta.special;
    exports org.advecta.transport;
    exports org.advecta.kernel;
    exports org.advecta.solution;
    exports org.advecta.halfspace;
    exports org.advecta.quadrature;
    exports org.advecta.plume;
    exports org.advecta.convolution;
    exports org.advecta.verify;
    exports org.advecta.moments;
    exports org.advecta.fit;

    // picocli reads the command classes' annotations reflectively.
    opens org.advecta.cli to info.picocli;
}
