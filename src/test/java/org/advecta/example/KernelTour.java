package org.advecta.example;

import java.io.PrintStream;
import java.util.Locale;
import org.advecta.kernel.FreeSpaceKernel1D;
import org.advecta.kernel.FreeSpaceKernel3D;
import org.advecta.special.ErrorFunctions;
import org.advecta.special.ExpErfc;
import org.advecta.transport.TransportParameters;

/**
 * A short runnable tour of the kernels, run by README's first command. The numbers are an
 * invented example: a dye released into a channel flowing at 0.4 m/s with 0.05 m²/s of
 * longitudinal dispersion.
 */
public final class KernelTour {

    private KernelTour() {
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
    }
}
