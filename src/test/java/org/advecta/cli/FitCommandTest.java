package org.advecta.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import org.advecta.fit.FitResult;
import org.advecta.fit.ModelFamily;
import org.advecta.fit.Observable;
import org.advecta.fit.Observations;
import org.advecta.fit.Parameter;
import org.advecta.fit.ParameterFit;
import org.advecta.fit.TransportModel;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InitialGaussian;
import org.advecta.solution.InitialSlug;
import org.advecta.solution.InitialStep;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

/**
 * {@code advecta fit}: noise-free data made by the library give back the parameters, noisy
 * data give intervals that hold the true values, the output files are valid and hold the
 * library's values, and a failed fit reports itself with exit status 3.
 */
class FitCommandTest {

    /** One row of the printed estimates table: estimate, SE, lower, upper. */
    static Map<String, double[]> estimates(String stdout) {
        final Map<String, double[]> m = new HashMap<>();
        boolean inTable = false;
        for (String line : stdout.split("\n")) {
            if (line.startsWith("parameter  ")) {
                inTable = true;
                continue;
            }
            if (inTable) {
                if (line.isBlank()) {
                    break;
                }
                final String[] f = line.trim().split("\\s+");
                final double[] v = new double[f.length - 1];
                for (int i = 1; i < f.length; i++) {
                    v[i - 1] = Double.parseDouble(f[i]);
                }
                m.put(f[0], v);
            }
        }
        return m;
    }

    static void writeCsv(Path file, String header, List<String> rows) throws IOException {
        final StringBuilder b = new StringBuilder(header).append('\n');
        rows.forEach(r -> b.append(r).append('\n'));
        Files.writeString(file, b.toString(), StandardCharsets.UTF_8);
    }

    private static List<String[]> rows(Path csv) throws IOException {
        final List<String[]> rows = new ArrayList<>();
        for (String line : Files.readAllLines(csv, StandardCharsets.UTF_8)) {
            rows.add(line.split(",", -1));
        }
        return rows;
    }

    static Document svg(Path file) throws Exception {
        final DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        final Document d = f.newDocumentBuilder().parse(file.toFile());
        assertEquals("svg", d.getDocumentElement().getLocalName());
        assertEquals("http://www.w3.org/2000/svg", d.getDocumentElement().getNamespaceURI());
        return d;
    }

    private static ThirdTypeInlet column(double v, double d) {
        return ThirdTypeInlet.of(TransportParameters.of(v, d), InletInput.pulse(1.0, 0.5));
    }

    @Test
    void noiseFreeBreakthroughCurveGivesBackVAndD(@TempDir Path dir) throws Exception {
        final Solution1D truth = column(0.6, 0.015);
        final List<String> rows = new ArrayList<>();
        for (int i = 1; i <= 60; i++) {
            final double t = 0.05 * i;
            rows.add("1.0," + t + "," + truth.fluxAveraged(1.0, t));
        }
        final Path data = dir.resolve("column.csv");
        writeCsv(data, "x,t,c", rows);
        final Path out = dir.resolve("out");
        final String stdout = Cli.run("fit", data.toString(), "inlet-third", "input=pulse",
            "t0=0.5", "--free", "v,D", "--observe", "flux-averaged", "-o", out.toString()).ok();
        final Map<String, double[]> est = estimates(stdout);
        assertEquals(2, est.size(), stdout);
        final double v = est.get("v")[0];
        final double d = est.get("D")[0];
        assertEquals(0.6, v, 0.6e-6, stdout);
        assertEquals(0.015, d, 0.015e-6, stdout);
        assertTrue(stdout.contains("status: CONVERGED"), stdout);
        assertTrue(stdout.contains("1 breakthrough curve at x = 1"), stdout);

        // fit.csv: the data rows verbatim, then the library's value at the printed estimates
        // (they read back to the identical doubles) and the residual, bit for bit.
        final Solution1D fitted = column(v, d);
        final List<String[]> table = rows(out.resolve("fit.csv"));
        assertEquals(List.of("x", "t", "c", "fitted", "residual"), List.of(table.get(0)));
        assertEquals(61, table.size());
        for (int i = 1; i < table.size(); i++) {
            final String[] r = table.get(i);
            assertEquals(rows.get(i - 1), String.join(",", r[0], r[1], r[2]));
            final double f = fitted.fluxAveraged(Double.parseDouble(r[0]),
                Double.parseDouble(r[1]));
            assertEquals(Double.doubleToLongBits(f), Double.doubleToLongBits(
                Double.parseDouble(r[3])), r[3]);
            assertEquals(Double.doubleToLongBits(Double.parseDouble(r[2]) - f),
                Double.doubleToLongBits(Double.parseDouble(r[4])));
        }
        final String report = Files.readString(out.resolve("fit.txt"), StandardCharsets.UTF_8);
        assertTrue(stdout.startsWith(report), "standard output starts with the report");
        for (String part : new String[] {"status: CONVERGED", "standard error", "lower 95 %",
            "upper 95 %", "correlation of the estimates", "R^2 = ", "fixed: R = 1, mu = 0, "
                + "input = pulse, C0 = 1, t0 = 0.5, Ci = 0"}) {
            assertTrue(report.contains(part), part);
        }
        svg(out.resolve("fit.svg"));
        try (var files = Files.list(out)) {
            assertEquals(3, files.count(), "fit.csv, fit.svg, fit.txt and nothing else");
        }
    }

    @Test
    void noiseFreeProfilesGiveBackVDAndMassWithWeightsAndPngPlot(@TempDir Path dir)
            throws Exception {
        final Solution1D truth = InitialGaussian.of(TransportParameters.of(0.3, 0.02)
            .withRetardation(1.5), 0.2, 0.05, 2.5);
        final List<String> rows = new ArrayList<>();
        for (double t : new double[] {1.0, 2.0}) {
            for (int i = 0; i <= 50; i++) {
                final double x = -0.3 + 0.02 * i;
                rows.add(x + "," + t + "," + truth.value(x, t) + "," + (1 + i % 3));
            }
        }
        final Path data = dir.resolve("plume.csv");
        writeCsv(data, "x,t,c,w", rows);
        final Path out = dir.resolve("out");
        final String stdout = Cli.run("fit", data.toString(), "gaussian", "xc=0.2", "s0=0.05",
            "R=1.5", "--free", "v,D,M", "-o", out.toString(), "--plots", "png").ok();
        final Map<String, double[]> est = estimates(stdout);
        assertEquals(0.3, est.get("v")[0], 0.3e-6, stdout);
        assertEquals(0.02, est.get("D")[0], 0.02e-6, stdout);
        assertEquals(2.5, est.get("M")[0], 2.5e-6, stdout);
        assertTrue(stdout.contains("2 profiles at t = 1, 2; weights from column w"), stdout);
        final BufferedImage png = ImageIO.read(out.resolve("fit.png").toFile());
        assertEquals(Plots.WIDTH, png.getWidth());
        assertEquals(Plots.HEIGHT, png.getHeight());
    }

    /** One more family each: the command maps its keys to the library's model. */
    @Test
    void stepSlugAndExponentialInletMapToTheLibrarysModels(@TempDir Path dir) throws Exception {
        final Solution1D step = InitialStep.of(TransportParameters.of(0.5, 0.02), 0.3, 1.0,
            InitialStep.Side.RIGHT);
        final Solution1D slug = InitialSlug.of(TransportParameters.of(0.5, 0.02)
            .withRetardation(2), 0.0, 0.2, 3.0);
        final Solution1D inlet = FirstTypeInlet.of(TransportParameters.of(1.0, 0.05)
            .withDecay(0.1), InletInput.exponential(1.0, 0.3));
        final List<String> stepRows = new ArrayList<>();
        final List<String> slugRows = new ArrayList<>();
        final List<String> inletRows = new ArrayList<>();
        for (int i = 0; i <= 60; i++) {
            final double x = -0.5 + 2.0 * i / 60;
            stepRows.add(x + ",0.4," + step.value(x, 0.4));
            slugRows.add(x + ",1.0," + slug.value(x, 1.0));
            final double t = 0.05 + 0.05 * i;
            inletRows.add("1.0," + t + "," + inlet.value(1.0, t));
        }
        final Object[][] cases = {
            {stepRows, new String[] {"step", "x0=0.3", "side=right"}, 0.5, 0.02},
            {slugRows, new String[] {"slug", "a=0", "b=0.2", "R=2", "--free", "v,D,C0"}, 0.5,
                0.02},
            {inletRows, new String[] {"inlet-first", "input=exponential", "lambda=0.3",
                "mu=0.1"}, 1.0, 0.05}};
        int k = 0;
        for (Object[] c : cases) {
            @SuppressWarnings("unchecked")
            final List<String> rows = (List<String>) c[0];
            final Path data = dir.resolve("case" + k + ".csv");
            writeCsv(data, "x,t,c", rows);
            final String[] args = Stream.concat(Stream.of("fit", data.toString()),
                Stream.concat(Stream.of((String[]) c[1]), Stream.of("-o",
                    dir.resolve("out" + k++).toString()))).toArray(String[]::new);
            final String stdout = Cli.run(args).ok();
            final Map<String, double[]> est = estimates(stdout);
            assertEquals((double) c[2], est.get("v")[0], 1e-6 * (double) c[2], stdout);
            assertEquals((double) c[3], est.get("D")[0], 1e-6 * (double) c[3], stdout);
            if (est.containsKey("C0")) {
                assertEquals(3.0, est.get("C0")[0], 3e-6, stdout);
            }
        }
    }

    @Test
    void noisyDataGiveIntervalsThatHoldTheTrueValues(@TempDir Path dir) throws Exception {
        final double v = 0.4;
        final double d = 0.01;
        final Solution1D truth = FirstTypeInlet.of(TransportParameters.of(v, d),
            InletInput.constant(2.0));
        // Seeded Gaussian noise, sigma = 0.02 (1 % of the inlet level).
        final Random random = new Random(20261202L);
        final List<String> rows = new ArrayList<>();
        for (double x : new double[] {0.5, 1.0}) {
            for (int i = 1; i <= 40; i++) {
                final double t = 0.1 * i;
                rows.add("MW-" + x + "," + x + "," + t + ","
                    + (truth.value(x, t) + 0.02 * random.nextGaussian()));
            }
        }
        final Path data = dir.resolve("wells.csv");
        writeCsv(data, "well,x,t,c", rows);
        final Path out = dir.resolve("out");
        final String stdout = Cli.run("fit", data.toString(), "inlet-first", "C0=2",
            "--free", "v,D", "-o", out.toString()).ok();
        final Map<String, double[]> est = estimates(stdout);
        for (Map.Entry<String, Double> e : Map.of("v", v, "D", d).entrySet()) {
            final double[] r = est.get(e.getKey());
            assertTrue(r[2] < e.getValue() && e.getValue() < r[3],
                e.getKey() + " = " + e.getValue() + " outside [" + r[2] + ", " + r[3] + "]");
            // the interval is the estimate +- t quantile * SE; a noisy fit is not exact
            assertTrue(r[1] > 0 && r[0] != e.getValue());
        }
        assertTrue(stdout.contains("2 breakthrough curves at x = 0.5, 1"), stdout);
        // The printed numbers are the library's own, bit for bit: the same fit through the API.
        final double[][] t = new double[2][40];
        final double[][] c = new double[2][40];
        for (int k = 0; k < 80; k++) {
            final String[] f = rows.get(k).split(",");
            t[k / 40][k % 40] = Double.parseDouble(f[2]);
            c[k / 40][k % 40] = Double.parseDouble(f[3]);
        }
        final FitResult api = ParameterFit.fit(TransportModel.of(ModelFamily.firstTypeInlet(
                InletInput.constant(1)), Observable.RESIDENT)
            .withFree(Parameter.VELOCITY, Parameter.DISPERSION)
            .withValue(Parameter.RETARDATION, 1).withValue(Parameter.DECAY, 0)
            .withValue(Parameter.SOURCE, 2),
            Observations.breakthrough(0.5, t[0], c[0]).and(
                Observations.breakthrough(1.0, t[1], c[1])));
        for (Parameter p : new Parameter[] {Parameter.VELOCITY, Parameter.DISPERSION}) {
            final double[] r = est.get(p.symbol());
            final double[] expected = {api.value(p), api.standardError(p), api.lower95(p),
                api.upper95(p)};
            for (int j = 0; j < 4; j++) {
                assertEquals(Double.doubleToLongBits(expected[j]), Double.doubleToLongBits(r[j]),
                    p.symbol() + " column " + j);
            }
        }
        // extra columns pass through to fit.csv
        final List<String[]> table = rows(out.resolve("fit.csv"));
        assertEquals("well", table.get(0)[0]);
        assertEquals("MW-1.0", table.get(80)[0]);
    }

    @Test
    void failedFitReportsItsStatusWritesTheReportAndExitsWith3(@TempDir Path dir)
            throws Exception {
        final Solution1D truth = column(0.5, 0.03);
        final List<String> rows = new ArrayList<>();
        for (int i = 1; i <= 40; i++) {
            final double t = 0.1 * i;
            rows.add("1," + t + "," + truth.value(1.0, t));
        }
        final Path data = dir.resolve("d.csv");
        writeCsv(data, "x,t,c", rows);
        final Path out = dir.resolve("out");
        // v and R cannot both be told from one curve: only v/R enters.
        final Cli.Result r = Cli.run("fit", data.toString(), "inlet-third", "input=pulse",
            "t0=0.5", "--free", "v,D,R", "-o", out.toString());
        assertEquals(Main.FIT_FAILED, r.status, r.err);
        assertTrue(r.out.contains("status: NOT_IDENTIFIABLE"), r.out);
        assertTrue(r.out.contains("value reached (not an estimate"), r.out);
        assertEquals("advecta fit: the fit failed (NOT_IDENTIFIABLE); see "
            + out.resolve("fit.txt") + "\n", r.err);
        assertFalse(r.err.contains("Exception"));
        final String report = Files.readString(out.resolve("fit.txt"), StandardCharsets.UTF_8);
        assertTrue(report.contains("status: NOT_IDENTIFIABLE"));
        svg(out.resolve("fit.svg"));
    }
}
