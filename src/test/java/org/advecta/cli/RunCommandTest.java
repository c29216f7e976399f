package org.advecta.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import org.advecta.kernel.FreeSpaceKernel1D;
import org.advecta.kernel.FreeSpaceKernel2D;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.NodeList;

/** {@code run} on the demo scenario and on small scenarios with known answers. */
class RunCommandTest {

    private static final Path DEMO = Path.of("scenarios/road-salt-spill.toml");
    /** The copy of the demo's breakthrough plot that README shows. */
    private static final Path DOCS_PLOT = Path.of("docs/road-salt-spill-breakthrough.svg");

    private static final Set<String> DEMO_FILES = Set.of("profiles.csv", "profiles.svg",
        "breakthrough.csv", "breakthrough.svg", "plan.csv", "plan.svg", "summary.txt");

    private static Set<String> names(Path dir) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).collect(Collectors.toSet());
        }
    }

    private static Document svg(Path file) throws Exception {
        final DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        final Document d = f.newDocumentBuilder().parse(file.toFile());
        assertEquals("svg", d.getDocumentElement().getLocalName(), file.toString());
        assertEquals("http://www.w3.org/2000/svg", d.getDocumentElement().getNamespaceURI());
        return d;
    }

    private static List<String> texts(Document d) {
        final NodeList nodes = d.getElementsByTagNameNS("*", "text");
        final List<String> texts = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            texts.add(nodes.item(i).getTextContent());
        }
        return texts;
    }

    private static List<String[]> rows(Path csv) throws IOException {
        final List<String[]> rows = new ArrayList<>();
        for (String line : Files.readAllLines(csv, StandardCharsets.UTF_8)) {
            rows.add(line.split(",", -1));
        }
        return rows;
    }

    @Test
    void demoWritesEveryPromisedFileWithValidPlots(@TempDir Path dir) throws Exception {
        final Path out = dir.resolve("demo");
        final String stdout = Cli.run("run", DEMO.toString(), "--out", out.toString()).ok();
        assertEquals(DEMO_FILES, names(out));
        for (String name : DEMO_FILES) {
            assertTrue(stdout.contains(out.resolve(name).toString()), name);
            if (name.endsWith(".svg")) {
                final Document d = svg(out.resolve(name));
                assertEquals(String.valueOf(Plots.WIDTH),
                    d.getDocumentElement().getAttribute("width"));
            }
        }
        final String summary = Files.readString(out.resolve("summary.txt"),
            StandardCharsets.UTF_8);
        assertTrue(stdout.startsWith(summary), "standard output starts with the summary");
        assertTrue(texts(svg(out.resolve("breakthrough.svg")))
            .contains("Chloride from a road-salt spill: breakthrough curves"));
        // the plan view is one embedded image, not a rectangle per cell
        assertTrue(Files.size(out.resolve("plan.svg")) < 200_000);
    }

    @Test
    void demoTablesAreTheLibrarysValuesBitForBit(@TempDir Path dir) throws Exception {
        Cli.run("run", DEMO.toString(), "--out", dir.toString(), "--quiet").ok();
        // the demo: release-2d, v = 0.25, D = 0.5, DT = 0.05, R = 1, mu = 0, at (0, 0), M = 2e5
        final FreeSpaceKernel2D k = FreeSpaceKernel2D.of(
            TransportParameters.of(0.25, 0.5).withDispersion(0.5, 0.05, 0.05), 0, 0);
        final List<String[]> profiles = rows(dir.resolve("profiles.csv"));
        assertArrayEquals(new String[] {"x", "y", "t", "c"}, profiles.get(0));
        assertEquals(4 * 461 + 1, profiles.size());
        final List<String[]> curves = rows(dir.resolve("breakthrough.csv"));
        assertArrayEquals(new String[] {"point", "x", "y", "t", "c"}, curves.get(0));
        assertEquals(3 * 801 + 1, curves.size());
        final List<String[]> plan = rows(dir.resolve("plan.csv"));
        assertArrayEquals(new String[] {"x", "y", "t", "c"}, plan.get(0));
        assertEquals(141 * 51 + 1, plan.size());
        int nonZero = 0;
        for (List<String[]> table : List.of(profiles, plan, curves)) {
            final int o = table == curves ? 1 : 0;
            for (String[] r : table.subList(1, table.size())) {
                final double expected = 2.0e5 * k.value(Double.parseDouble(r[o]),
                    Double.parseDouble(r[o + 1]), Double.parseDouble(r[o + 2]));
                assertEquals(Double.doubleToRawLongBits(expected),
                    Double.doubleToRawLongBits(Double.parseDouble(r[o + 3])), String.join(",", r));
                nonZero += expected > 0 ? 1 : 0;
            }
        }
        assertTrue(nonZero > 5000, "nonZero = " + nonZero);
        // grid ends are exact
        assertEquals("-30.0", profiles.get(1)[0]);
        assertEquals("200.0", profiles.get(461)[0]);
    }

    @Test
    void demoSummaryReportsPeaksArrivalsAndMassBalance(@TempDir Path dir) throws IOException {
        final String summary = Cli.run("run", DEMO.toString(), "--out", dir.toString()).ok();
        for (String point : List.of("MW1 at (25, 0) m:", "MW2 at (50, 4) m:",
                "supply well at (120, 0) m:")) {
            assertTrue(summary.contains(point), point);
        }
        assertEquals(3, count(summary, "peak c = "));
        assertEquals(3, count(summary, "c first reaches 250 mg/L: "));
        assertEquals(1, count(summary, "c first reaches 250 mg/L: not within the window"));
        final Matcher m = Pattern.compile("relative difference (\\S+)\\)").matcher(summary);
        assertTrue(m.find(), summary);
        // the plan view holds the plume: the trapezoidal sum over it matches M to ~1e-5
        assertTrue(Math.abs(Double.parseDouble(m.group(1))) < 1e-4, m.group(1));
    }

    private static int count(String text, String part) {
        int n = 0;
        for (int i = text.indexOf(part); i >= 0; i = text.indexOf(part, i + 1)) {
            n++;
        }
        return n;
    }

    @Test
    void pngPlotsDecode(@TempDir Path dir) throws IOException {
        Cli.run("run", DEMO.toString(), "--out", dir.toString(), "--plots", "png", "-q").ok();
        assertEquals(Set.of("profiles.csv", "profiles.png", "breakthrough.csv",
            "breakthrough.png", "plan.csv", "plan.png", "summary.txt"), names(dir));
        for (String name : List.of("profiles.png", "breakthrough.png", "plan.png")) {
            final BufferedImage image = ImageIO.read(dir.resolve(name).toFile());
            assertNotNull(image, name);
            assertEquals(Plots.WIDTH, image.getWidth());
            assertEquals(Plots.HEIGHT, image.getHeight());
        }
        Cli.run("run", DEMO.toString(), "--out", dir.toString(), "--plots", "gif")
            .userError("--plots gif: must be svg or png");
    }

    @Test
    void svgOutputIsTheSameFromRunToRun(@TempDir Path dir) throws IOException {
        Cli.run("run", DEMO.toString(), "--out", dir.resolve("a").toString(), "-q").ok();
        Cli.run("run", DEMO.toString(), "--out", dir.resolve("b").toString(), "-q").ok();
        for (String name : DEMO_FILES) {
            assertArrayEquals(Files.readAllBytes(dir.resolve("a").resolve(name)),
                Files.readAllBytes(dir.resolve("b").resolve(name)), name);
        }
    }

    @Test
    void readmePlotIsACopyOfTheDemosPlot(@TempDir Path dir) throws Exception {
        Cli.run("run", DEMO.toString(), "--out", dir.toString(), "-q").ok();
        final List<String> fresh = texts(svg(dir.resolve("breakthrough.svg")));
        final List<String> committed = texts(svg(DOCS_PLOT));
        // title and legend (tick labels may differ with the fonts of another machine)
        for (String text : List.of("Chloride from a road-salt spill: breakthrough curves",
                "MW1 (25, 0)", "MW2 (50, 4)", "supply well (120, 0)", "level 250 mg/L")) {
            assertTrue(fresh.contains(text), text);
            assertTrue(committed.contains(text), () -> DOCS_PLOT + " is out of date: it lacks '"
                + text + "'; copy target/demo/breakthrough.svg there after running the demo");
        }
    }

    @Test
    void peakTimeAndArrivalAgreeWithTheClosedForm(@TempDir Path dir) throws IOException {
        // release-1d with R = 1, mu = 0: ln c = ln M − ½ ln(4πDt) − (x − vt)²/(4Dt), and
        // d ln c/dt = 0 gives v²t² + 2Dt − x² = 0, t* = (√(D² + v²x²) − D)/v² (derived here).
        final double v = 1.0;
        final double d = 0.1;
        final double x = 5.0;
        final Path file = dir.resolve("pulse.toml");
        Files.writeString(file, "family = \"release-1d\"\n[medium]\nv = 1.0\nD = 0.1\n"
            + "[source]\nM = 2.0\n[breakthrough]\nt = { from = 0.0, to = 10.0, points = 41 }\n"
            + "[[breakthrough.at]]\nx = 5.0\n[summary]\nlevel = 0.5\n", StandardCharsets.UTF_8);
        final String summary = Cli.run("run", file.toString(), "--out",
            dir.resolve("out").toString()).ok();
        final Matcher peak = Pattern.compile("peak c = (\\S+) C at t = (\\S+) T").matcher(summary);
        assertTrue(peak.find(), summary);
        final double tStar = (Math.sqrt(d * d + v * v * x * x) - d) / (v * v);
        final FreeSpaceKernel1D k = FreeSpaceKernel1D.of(TransportParameters.of(v, d), 0);
        // six significant digits printed; samples every 0.25 would be 2.4 % off
        assertEquals(tStar, Double.parseDouble(peak.group(2)), 1e-5 * tStar);
        assertEquals(2.0 * k.value(x, tStar), Double.parseDouble(peak.group(1)),
            1e-5 * 2.0 * k.value(x, tStar));
        final Matcher arrival = Pattern.compile("reaches 0.5 C: t = (\\S+) T").matcher(summary);
        assertTrue(arrival.find(), summary);
        final double ta = Double.parseDouble(arrival.group(1));
        assertTrue(ta < tStar);
        // c rises through the level at ta (to the printed six digits)
        assertTrue(2.0 * k.value(x, ta * (1 - 1e-5)) < 0.5);
        assertTrue(2.0 * k.value(x, ta * (1 + 1e-5)) > 0.5);
        assertTrue(summary.contains("Wrote:"));
    }

    @Test
    void longRunsShowProgressAndQuietShowsNothing(@TempDir Path dir) throws IOException {
        final Path file = dir.resolve("big.toml");
        Files.writeString(file, "family = \"release-3d\"\n[medium]\nv = 1.0\nD = 0.1\n"
            + "DT = 0.01\nDV = 0.01\n[plan]\ntime = 5.0\nz = 0.0\n"
            + "x = { from = 0.0, to = 10.0, points = 401 }\n"
            + "y = { from = -2.0, to = 2.0, points = 301 }\n", StandardCharsets.UTF_8);
        final Cli.Result r = Cli.run("run", file.toString(), "--out", dir.resolve("a").toString());
        assertEquals(0, r.status, r.err);
        assertTrue(r.err.startsWith("advecta run: computing 120701 values\n"), r.err);
        assertTrue(r.err.contains("advecta run: 50%\n") && r.err.endsWith("advecta run: 100%\n"),
            r.err);
        assertTrue(r.out.contains("no mass balance for a slice through a 3D field"), r.out);
        final Cli.Result quiet = Cli.run("run", file.toString(), "--out",
            dir.resolve("b").toString(), "--quiet");
        assertEquals("", quiet.ok());
        assertEquals(Set.of("plan.csv", "plan.svg", "summary.txt"), names(dir.resolve("b")));
    }

    @Test
    void oneDimensionalInletRunBalancesItsMass(@TempDir Path dir) throws IOException {
        // a bromide pulse fed into a column: 100 mg/L for 6 h, v = 0.6 m/d, D = 6e-3 m²/d
        final Path file = dir.resolve("column.toml");
        Files.writeString(file, "title = \"column\"\nfamily = \"inlet-third\"\n"
            + "[units]\nlength = \"m\"\ntime = \"d\"\nconcentration = \"mg/L\"\n"
            + "[medium]\nv = 0.6\nD = 6e-3\nR = 1.2\nmu = 0.05\n"
            + "[source]\ninput = \"pulse\"\nC0 = 100.0\nt0 = 0.25\nCi = 2.0\n"
            + "[profiles]\ntimes = [0.1, 0.3, 0.6]\nx = { from = 0.0, to = 1.5, points = 3001 }\n"
            + "[breakthrough]\nt = { from = 0.0, to = 1.5, points = 301 }\n"
            + "[[breakthrough.at]]\nname = \"outlet\"\nx = 0.3\n[summary]\nlevel = 50.0\n",
            StandardCharsets.UTF_8);
        final Path out = dir.resolve("out");
        final String summary = Cli.run("run", file.toString(), "--out", out.toString()).ok();
        assertEquals(Set.of("profiles.csv", "profiles.svg", "breakthrough.csv",
            "breakthrough.svg", "summary.txt"), names(out));
        assertArrayEquals(new String[] {"x", "t", "c"}, rows(out.resolve("profiles.csv")).get(0));
        final Matcher m = Pattern.compile("integral of c - background dx over the window = "
            + "\\S+ mg/L m; exact over the whole domain = \\S+ \\(relative difference (\\S+)\\)")
            .matcher(summary);
        int rows = 0;
        while (m.find()) {
            // trapezoidal rule with h = 5e-4 m on profiles a few cm wide
            assertTrue(Math.abs(Double.parseDouble(m.group(1))) < 1e-5, m.group());
            rows++;
        }
        assertEquals(3, rows, summary);
        assertTrue(summary.contains("outlet at (0.3) m:"), summary);
    }
}
