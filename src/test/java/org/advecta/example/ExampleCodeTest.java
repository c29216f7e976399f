package org.advecta.example;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InletInput;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/** Keeps README's usage example compiling, running and in sync with this copy. */
class ExampleCodeTest {

    @Test
    void readmeUsageExampleRuns() throws IOException {
        // --- the lines below are README's usage example, verbatim ---
        TransportParameters p = TransportParameters.of(0.6, 5e-3).withRetardation(1.5).withDecay(0.01);
        FirstTypeInlet column = FirstTypeInlet.of(p, InletInput.constant(500));
        double c = column.value(0.35, 0.5);                 // mg/L at x = 0.35 m, t = 0.5 d
        double[] times = {0.5, 1, 2}, out = new double[3];
        column.breakthrough(0.35, times, out);              // a breakthrough curve
        // --- end of the example ---
        assertEquals(c, out[0], 0.0);
        assertTrue(out[0] < out[1] && out[1] < out[2] && out[2] <= 500);
        final String readme = Files.readString(Path.of("README.md"), StandardCharsets.UTF_8);
        for (String line : new String[] {
            "TransportParameters p = TransportParameters.of(0.6, 5e-3).withRetardation(1.5).withDecay(0.01);",
            "FirstTypeInlet column = FirstTypeInlet.of(p, InletInput.constant(500));",
            "double c = column.value(0.35, 0.5);",
            "double[] times = {0.5, 1, 2}, out = new double[3];",
            "column.breakthrough(0.35, times, out);"}) {
            assertTrue(readme.contains(line), "README no longer shows: " + line);
        }
    }
}
