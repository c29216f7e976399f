package org.advecta.example;

import java.io.PrintStream;
import java.util.Locale;
import org.advecta.kernel.FreeSpaceKernel1D;
import org.advecta.kernel.FreeSpaceKernel3D;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InletInput;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.special.ErrorFunctions;
import org.advecta.special.ExpErfc;
import org.advecta.transport.TransportParameters;

/**
 * A short runnable tour of the library, run by README's first command. The numbers are an
 * invented example: a dye released into a channel, a plume in an aquifer, and a soil column
 * fed with a tracer.
 */
public final class Tour {

    private Tour() {
    }

    /**
     * Prints the tour.
     *
     * @param args ignored
     */
    public static void main(String[] args) {
        final PrintStream out = System.out;
        final TransportParameters channel = TransportParameters.of(0.4, 0.05);
        final FreeSpaceKernel1D dye = FreeSpaceKernel1D.of(channel, 0.0);
        out.println("Dye released at x = 0 m into a channel: v = 0.4 m/s, D = 0.05 m2/s");
        out.println("concentration per unit released mass (1/m) after 60 s:");
        for (double x = 16; x <= 32; x += 2) {
            out.printf(Locale.ROOT, "  x = %5.1f m   G = %.6e%n", x, dye.value(x, 60.0));
        }

        out.println();
        out.println("exp(a)*erfc(b) at Peclet number 1e6 (a = 1e6, b = 1e3):");
        final double a = 1e6;
        final double b = 1e3;
        out.printf(Locale.ROOT, "  naive Math.exp(a)*erfc(b) = %s%n",
            Math.exp(a) * ErrorFunctions.erfc(b));
        out.printf(Locale.ROOT, "  ExpErfc.value(a, b)       = %.16e%n", ExpErfc.value(a, b));

        out.println();
        final TransportParameters aquifer = TransportParameters.of(0.1, 0.5)
            .withDispersion(0.5, 0.05, 0.005).withRetardation(2.0).withDecay(0.001);
        final FreeSpaceKernel3D plume = FreeSpaceKernel3D.of(aquifer, 0, 0, 0);
        out.println("3D release in an aquifer (v = 0.1 m/d, DL/DT/DV = 0.5/0.05/0.005 m2/d,"
            + " R = 2, mu = 0.001 /d), centreline after 200 d:");
        for (double x = 0; x <= 20; x += 5) {
            out.printf(Locale.ROOT, "  x = %4.1f m   G = %.6e 1/m3%n", x, plume.value(x, 0, 0, 200));
        }

        out.println();
        final TransportParameters column = TransportParameters.of(0.5, 1e-4)
            .withRetardation(1.2);
        out.println("Soil column fed with a tracer of 100 mg/L: v = 0.5 m/d, D = 1e-4 m2/d,"
            + " R = 1.2 (Peclet number 1000 over 0.2 m); breakthrough at x = 0.2 m:");
        final FirstTypeInlet held = FirstTypeInlet.of(column, InletInput.constant(100));
        final ThirdTypeInlet fed = ThirdTypeInlet.of(column, InletInput.constant(100));
        out.println("  t (d)   first-type inlet   flux inlet (resident)   flux inlet (effluent)");
        for (double t = 0.40; t <= 0.561; t += 0.04) {
            out.printf(Locale.ROOT, "  %.2f    %14.6f    %19.6f    %19.6f%n", t,
                held.value(0.2, t), fed.value(0.2, t), fed.fluxAveraged(0.2, t));
        }
    }
}
