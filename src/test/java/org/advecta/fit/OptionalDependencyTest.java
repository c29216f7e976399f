package org.advecta.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.net.URL;
import java.net.URLClassLoader;
import org.junit.jupiter.api.Test;

/**
 * Without commons-math3 at run time the fitting entry point fails with an
 * {@link IllegalStateException} naming the artifact: the library's classes are loaded in a
 * class loader that sees only them (and the bootstrap classes), not the optional dependency.
 */
class OptionalDependencyTest {

    @Test
    void fittingWithoutCommonsMathNamesTheMissingArtifact() throws Exception {
        final URL classes = ParameterFit.class.getProtectionDomain().getCodeSource()
            .getLocation();
        try (URLClassLoader isolated = new URLClassLoader(new URL[] {classes},
                (ClassLoader) null)) {
            assertThrows(ClassNotFoundException.class,
                () -> Class.forName(ParameterFit.OPTIMIZER_CLASS, false, isolated));
            final Class<?> fit = Class.forName(ParameterFit.class.getName(), true, isolated);
            final Class<?> model = Class.forName(TransportModel.class.getName(), false, isolated);
            final Class<?> data = Class.forName(Observations.class.getName(), false, isolated);
            final Method m = fit.getMethod("fit", model, data);
            final InvocationTargetException e = assertThrows(InvocationTargetException.class,
                () -> m.invoke(null, null, null));
            assertEquals(IllegalStateException.class, e.getCause().getClass());
            assertTrue(e.getCause().getMessage().contains(
                "org.apache.commons:commons-math3:3.6.1"), e.getCause().getMessage());
        }
    }
}
