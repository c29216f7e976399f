package org.advecta.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import org.advecta.fit.FitResult;
import org.advecta.fit.ModelFamily;
import org.advecta.fit.Observable;
import org.advecta.fit.Observations;
import org.advecta.fit.Parameter;
import org.advecta.fit.ParameterFit;
import org.advecta.fit.TransportModel;
import org.advecta.solution.InitialStep;
import org.advecta.solution.Solution1D;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code advecta fit DATA.csv FAMILY key=value ... --free v,D}: fits free transport parameters
 * of a one-dimensional family to measured concentrations ({@link ParameterFit}), prints the
 * estimates with standard errors and 95 % intervals, and writes the data with the fitted
 * values, a plot of data against fit and a text report.
 */
@Command(name = "fit", mixinStandardHelpOptions = true,
    description = {
        "Fit parameters of a 1-D family to measured concentrations (weighted "
            + "Levenberg-Marquardt).",
        "DATA.csv has columns x, t, c and optionally w (weights, e.g. 1/sigma^2); other "
            + "columns are passed through. Rows with the same x form a breakthrough curve "
            + "when there are fewer distinct x than distinct t values; otherwise rows with "
            + "the same t form a profile.",
        "FAMILY is one of step, slug, gaussian, inlet-first, inlet-third. key=value gives "
            + "the fixed parameters and the starting values of free ones (free ones without "
            + "a value start from the data's moments).",
        "Writes into the output folder: fit.csv (the data with columns fitted and residual), "
            + "fit.svg or fit.png (data against the fitted curves) and fit.txt (estimates, "
            + "standard errors, 95 %% intervals, correlations, R^2, status)."},
    footer = {"", "Exit status: 0 a converged fit; 3 a fit that failed (not converged, not "
        + "identifiable, on a bound, model failed): the status and its reason are printed "
        + "and written to fit.txt; 2 a mistake in the command or the data (one line on "
        + "standard error, no files written).",
        "", "Example:",
        "  advecta fit column.csv inlet-third input=pulse t0=0.5 --free v,D \\",
        "      --observe flux-averaged -o fitted"})
final class FitCommand implements Callable<Integer> {

    /** The 1-D families a fit supports, with the key of their source strength. */
    private static final Map<String, String> SOURCE_KEY = Map.of(
        "step", "C0", "slug", "C0", "gaussian", "M", "inlet-first", "C0", "inlet-third", "C0");

    /** The columns fit.csv appends. */
    private static final List<String> APPENDED = List.of("fitted", "residual");

    /** Samples of each fitted curve in the plot. */
    private static final int LINE_SAMPLES = 401;

    private final Main.Io io;

    @Parameters(index = "0", paramLabel = "DATA.csv", description = "the measurements: x, t, c[, w]")
    private Path data;

    @Parameters(index = "1", paramLabel = "FAMILY",
        description = "step, slug, gaussian, inlet-first or inlet-third")
    private String familyName;

    @Parameters(index = "2..*", arity = "0..*", paramLabel = "KEY=VALUE",
        description = "fixed values and starting values, e.g. t0=0.5 v=0.4 (see list)")
    private List<String> assignments = new ArrayList<>();

    @Option(names = "--free", paramLabel = "KEYS", defaultValue = "v,D",
        description = "the parameters to fit, among v, D, R, mu and the source (C0, or M for "
            + "gaussian), comma-separated (default: ${DEFAULT-VALUE})")
    private String free;

    @Option(names = "--observe", paramLabel = "KIND", defaultValue = "resident",
        description = "what c measures: resident or flux-averaged (default: ${DEFAULT-VALUE})")
    private String observe;

    @Option(names = {"-o", "--out"}, paramLabel = "DIR", defaultValue = "advecta-output",
        description = "output folder, created if needed (default: ${DEFAULT-VALUE})")
    private Path out;

    @Option(names = "--plots", paramLabel = "FORMAT", defaultValue = "svg",
        description = "plot format: svg or png (default: ${DEFAULT-VALUE})")
    private String plots;

    /**
     * Creates the command.
     *
     * @param io the streams to use
     */
    FitCommand(Main.Io io) {
        this.io = io;
    }

    /** One curve of the data: the rows that share x (breakthrough) or t (profile). */
    private static final class Curve {
        final double fixed;
        final List<Integer> rows = new ArrayList<>();

        Curve(double fixed) {
            this.fixed = fixed;
        }
    }

    @Override
    public Integer call() {
        final Plots.Format format = Plots.Format.parse(plots);
        final Observable observable = observable(observe);
        final Family family = Families.find(familyName);
        final String sourceKey = SOURCE_KEY.get(family.name());
        if (sourceKey == null) {
            throw new UserError("family " + family.name() + " cannot be fitted (fit supports "
                + "step, slug, gaussian, inlet-first, inlet-third)");
        }
        final Map<String, Parameter> freeKeys = freeKeys(free, family, sourceKey);
        final Map<String, Object> raw = EvalCommand.assignments(assignments);
        final Params params = Params.of(family, raw, freeKeys.keySet());
        final boolean halfLine = family.name().startsWith("inlet");
        if (halfLine && params.get("Ci") != 0) {
            throw new UserError("family " + family.name() + ": fit supports Ci = 0 only (got Ci = "
                + ParamSpec.format(params.get("Ci")) + ")");
        }
        if (params.has("v") && params.has("D")) {
            // The combination checks of eval (e.g. lambda beyond the closed form).
            family.create(params);
        }
        final TransportModel model = model(family, params, raw, freeKeys, sourceKey,
            observable);

        final DataTable table = DataTable.read(data);
        final Measurements m = measurements(table, halfLine, family.name());
        final int k = freeKeys.size();
        if (m.x.length <= k) {
            throw new UserError(table.source() + ": " + m.x.length + " data rows for " + k
                + " free parameters (" + String.join(", ", freeKeys.keySet()) + "); a fit "
                + "needs more rows than free parameters");
        }
        final boolean breakthrough = distinct(m.x) < distinct(m.t) || distinct(m.x) == 1;
        final List<Curve> curves = group(breakthrough ? m.x : m.t);
        final Observations observations = observations(table, m, curves, breakthrough);

        final FitResult result;
        try {
            result = ParameterFit.fit(model, observations);
        } catch (IllegalArgumentException e) {
            throw new UserError(e.getMessage().replace("give one (withValue)",
                "give a starting value as key=value").replace("(withValue)", "(key=value)"), e);
        }

        // The fitted values at the data (null if the model cannot be evaluated there).
        final double[] fitted = fitted(result, observable, m);
        final Solution1D solution = fitted == null ? null : result.solution();
        final String report = report(family, params, freeKeys, raw, observable,
            table, m, curves, breakthrough, result, fitted != null);

        try {
            Files.createDirectories(out);
        } catch (IOException e) {
            throw new UserError("cannot create folder " + out + ": " + Main.reason(e), e);
        }
        final List<Path> written = new ArrayList<>();
        final Path csv = out.resolve("fit.csv");
        if (fitted != null) {
            AtomicOutput.write(csv, o -> writeTable(table, m, fitted, o));
            written.add(csv);
        } else {
            deleteStale(csv);
        }
        final Path plot = out.resolve("fit." + format.extension());
        Plots.write(chart(family, table, m, curves, breakthrough, result, solution,
            observable), plot, format);
        written.add(plot);
        final Path txt = out.resolve("fit.txt");
        AtomicOutput.write(txt, o -> o.write(report.getBytes(StandardCharsets.UTF_8)));
        written.add(txt);

        io.out().print(report);
        io.out().println();
        io.out().println("Wrote:");
        for (Path p : written) {
            io.out().println("  " + p);
        }
        io.out().flush();
        if (!result.isConverged()) {
            io.err().println("advecta fit: the fit failed (" + result.status() + "); see "
                + txt);
            return Main.FIT_FAILED;
        }
        return 0;
    }

    private static Observable observable(String text) {
        switch (text.strip()) {
            case "resident":
                return Observable.RESIDENT;
            case "flux-averaged":
                return Observable.FLUX_AVERAGED;
            default:
                throw new UserError("--observe " + text + ": must be resident or flux-averaged");
        }
    }

    /** The --free list: CLI key to library parameter, in the order given. */
    private static Map<String, Parameter> freeKeys(String list, Family family, String sourceKey) {
        final Map<String, Parameter> known = new LinkedHashMap<>();
        known.put("v", Parameter.VELOCITY);
        known.put("D", Parameter.DISPERSION);
        known.put("R", Parameter.RETARDATION);
        known.put("mu", Parameter.DECAY);
        known.put(sourceKey, Parameter.SOURCE);
        final Map<String, Parameter> chosen = new LinkedHashMap<>();
        for (String part : list.split(",", -1)) {
            final String key = part.strip();
            if (key.isEmpty()) {
                throw new UserError("--free " + list + ": empty name (expected e.g. v,D)");
            }
            final Parameter p = known.get(key);
            if (p == null) {
                throw new UserError("--free: '" + key + "' cannot be fitted in family "
                    + family.name() + " (fittable: " + String.join(", ", known.keySet()) + ")");
            }
            if (chosen.put(key, p) != null) {
                throw new UserError("--free: " + key + " given twice");
            }
        }
        return chosen;
    }

    private static TransportModel model(Family family, Params p, Map<String, Object> raw,
                                        Map<String, Parameter> freeKeys, String sourceKey,
                                        Observable observable) {
        final ModelFamily modelFamily;
        try {
            switch (family.name()) {
                case "step":
                    modelFamily = ModelFamily.step(p.get("x0"), "left".equals(p.word("side"))
                        ? InitialStep.Side.LEFT : InitialStep.Side.RIGHT);
                    break;
                case "slug":
                    modelFamily = ModelFamily.slug(p.get("a"), p.get("b"));
                    break;
                case "gaussian":
                    modelFamily = ModelFamily.gaussian(p.get("xc"), p.get("s0"));
                    break;
                case "inlet-first":
                    modelFamily = ModelFamily.firstTypeInlet(Families.input(p));
                    break;
                default:
                    modelFamily = ModelFamily.thirdTypeInlet(Families.input(p));
                    break;
            }
        } catch (IllegalArgumentException e) {
            throw new UserError("family " + family.name() + ": " + e.getMessage(), e);
        }
        TransportModel model = TransportModel.of(modelFamily, observable)
            .withFree(freeKeys.values().toArray(new Parameter[0]));
        final Map<String, Parameter> all = new LinkedHashMap<>();
        all.put("v", Parameter.VELOCITY);
        all.put("D", Parameter.DISPERSION);
        all.put("R", Parameter.RETARDATION);
        all.put("mu", Parameter.DECAY);
        all.put(sourceKey, Parameter.SOURCE);
        for (Map.Entry<String, Parameter> e : all.entrySet()) {
            final String key = e.getKey();
            final Parameter par = e.getValue();
            if (freeKeys.containsKey(key)) {
                if (raw.containsKey(key)) {
                    final double start = p.get(key);
                    if (!(start > par.lowerBound())) {
                        throw new UserError("parameter " + key + " = " + ParamSpec.format(start)
                            + ": the starting value of a free " + key + " must be > "
                            + ParamSpec.format(par.lowerBound()));
                    }
                    model = model.withValue(par, start);
                }
            } else if (p.has(key)) {
                model = model.withValue(par, p.get(key));
            }
        }
        return model;
    }

    /** The data's numbers, by row. */
    private static final class Measurements {
        final double[] x;
        final double[] t;
        final double[] c;
        final double[] w;

        Measurements(int n, boolean weighted) {
            x = new double[n];
            t = new double[n];
            c = new double[n];
            w = weighted ? new double[n] : null;
        }
    }

    private static Measurements measurements(DataTable table, boolean halfLine, String family) {
        final List<String> needed = List.of("x", "t", "c");
        table.forbid(List.of("y", "z"), "not a coordinate of a 1-D family (fit reads x, t, c "
            + "and optionally w)");
        table.forbid(APPENDED, "clashes with a column fit.csv appends (fitted, residual)");
        final int ix = table.required("x", needed);
        final int it = table.required("t", needed);
        final int ic = table.required("c", needed);
        final int iw = table.column("w");
        final int n = table.size();
        if (n == 0) {
            throw new UserError(table.source() + ": no data rows");
        }
        final Measurements m = new Measurements(n, iw >= 0);
        boolean nonZero = false;
        for (int i = 0; i < n; i++) {
            m.x[i] = table.number(i, ix) + 0.0; // + 0.0 turns -0.0 into 0.0
            m.t[i] = table.number(i, it) + 0.0;
            m.c[i] = table.number(i, ic);
            if (halfLine && !(m.x[i] >= 0)) {
                throw table.at(i, "x = " + ParamSpec.format(m.x[i]) + ": outside the "
                    + "half-line x >= 0 of family " + family);
            }
            if (!(m.t[i] >= 0)) {
                throw table.at(i, "t = " + ParamSpec.format(m.t[i]) + ": must be >= 0");
            }
            if (iw >= 0) {
                m.w[i] = table.number(i, iw);
                if (!(m.w[i] > 0)) {
                    throw table.at(i, "w = " + ParamSpec.format(m.w[i]) + ": a weight must "
                        + "be > 0");
                }
            }
            nonZero |= m.c[i] != 0;
        }
        if (!nonZero) {
            throw new UserError(table.source() + ": every c is 0; such data say nothing about "
                + "the transport parameters");
        }
        return m;
    }

    private static int distinct(double[] values) {
        return group(values).size();
    }

    /** Rows grouped by equal values, groups in order of first appearance. */
    private static List<Curve> group(double[] values) {
        final Map<Double, Curve> groups = new LinkedHashMap<>();
        for (int i = 0; i < values.length; i++) {
            groups.computeIfAbsent(values[i], Curve::new).rows.add(i);
        }
        return new ArrayList<>(groups.values());
    }

    private static Observations observations(DataTable table, Measurements m,
                                             List<Curve> curves, boolean breakthrough) {
        Observations all = null;
        for (Curve curve : curves) {
            final int n = curve.rows.size();
            final double[] s = new double[n];
            final double[] c = new double[n];
            final double[] w = m.w == null ? null : new double[n];
            boolean nonZero = false;
            for (int j = 0; j < n; j++) {
                final int i = curve.rows.get(j);
                s[j] = breakthrough ? m.t[i] : m.x[i];
                c[j] = m.c[i];
                if (w != null) {
                    w[j] = m.w[i];
                }
                nonZero |= c[j] != 0;
            }
            if (!nonZero) {
                throw new UserError(table.source() + ": the " + name(curve, breakthrough)
                    + " (" + n + " rows from line " + table.line(curve.rows.get(0))
                    + ") has c = 0 at every point; such a curve says nothing about the "
                    + "transport parameters (leave it out)");
            }
            final Observations o;
            try {
                o = breakthrough ? Observations.breakthrough(curve.fixed, s, c, w)
                    : Observations.profile(curve.fixed, s, c, w);
            } catch (IllegalArgumentException e) {
                throw new UserError(table.source() + ": " + e.getMessage(), e);
            }
            all = all == null ? o : all.and(o);
        }
        return all;
    }

    private static String name(Curve curve, boolean breakthrough) {
        return breakthrough ? "breakthrough curve at x = " + ParamSpec.format(curve.fixed)
            : "profile at t = " + ParamSpec.format(curve.fixed);
    }

    private static double predict(Solution1D s, Observable observable, double x, double t) {
        return observable == Observable.FLUX_AVERAGED ? s.fluxAveraged(x, t) : s.value(x, t);
    }

    /** The model at the data with the values reached; null if it cannot be evaluated. */
    private static double[] fitted(FitResult result, Observable observable, Measurements m) {
        try {
            final Solution1D s = result.solution();
            final double[] f = new double[m.x.length];
            for (int i = 0; i < f.length; i++) {
                f[i] = predict(s, observable, m.x[i], m.t[i]);
                if (!Double.isFinite(f[i])) {
                    return null;
                }
            }
            return f;
        } catch (IllegalArgumentException | IllegalStateException e) {
            return null;
        }
    }

    private static void writeTable(DataTable table, Measurements m, double[] fitted,
                                   java.io.OutputStream sink) throws IOException {
        final Writer w = new BufferedWriter(new OutputStreamWriter(sink, StandardCharsets.UTF_8));
        final List<String> header = new ArrayList<>(table.header());
        header.addAll(APPENDED);
        EvalCommand.FORMAT.printRecord(w, header.toArray());
        final List<String> row = new ArrayList<>();
        for (int i = 0; i < table.size(); i++) {
            row.clear();
            row.addAll(table.row(i));
            row.add(Double.toString(fitted[i]));
            row.add(Double.toString(m.c[i] - fitted[i]));
            EvalCommand.FORMAT.printRecord(w, row.toArray());
        }
        w.flush();
    }

    private static void deleteStale(Path file) {
        try {
            Files.deleteIfExists(file);
        } catch (IOException e) {
            throw new UserError("cannot remove the earlier " + file + ": " + Main.reason(e), e);
        }
    }

    private static org.jfree.chart.JFreeChart chart(Family family, DataTable table,
                                                    Measurements m, List<Curve> curves,
                                                    boolean breakthrough, FitResult result,
                                                    Solution1D solution,
                                                    Observable observable) {
        final List<String> names = new ArrayList<>();
        final List<double[]> dataX = new ArrayList<>();
        final List<double[]> dataY = new ArrayList<>();
        final List<double[]> lineX = new ArrayList<>();
        final List<double[]> lineY = new ArrayList<>();
        for (Curve curve : curves) {
            names.add((breakthrough ? "x = " : "t = ") + ParamSpec.format(curve.fixed));
            final int n = curve.rows.size();
            final double[] s = new double[n];
            final double[] c = new double[n];
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (int j = 0; j < n; j++) {
                final int i = curve.rows.get(j);
                s[j] = breakthrough ? m.t[i] : m.x[i];
                c[j] = m.c[i];
                lo = Math.min(lo, s[j]);
                hi = Math.max(hi, s[j]);
            }
            dataX.add(s);
            dataY.add(c);
            if (solution == null || !(hi > lo)) {
                lineX.add(new double[0]);
                lineY.add(new double[0]);
                continue;
            }
            final double[] ls = new double[LINE_SAMPLES];
            final double[] lc = new double[LINE_SAMPLES];
            for (int j = 0; j < LINE_SAMPLES; j++) {
                ls[j] = j == LINE_SAMPLES - 1 ? hi : lo + (hi - lo) * j / (LINE_SAMPLES - 1);
                try {
                    lc[j] = breakthrough ? predict(solution, observable, curve.fixed, ls[j])
                        : predict(solution, observable, ls[j], curve.fixed);
                } catch (IllegalArgumentException | IllegalStateException e) {
                    lc[j] = Double.NaN;
                }
            }
            lineX.add(ls);
            lineY.add(lc);
        }
        final String title = family.name() + " fitted to " + table.source()
            + (result.isConverged() ? "" : " (fit failed: " + result.status() + ")");
        return Plots.fit(title, breakthrough ? "t" : "x",
            observable == Observable.FLUX_AVERAGED ? "c (flux-averaged)" : "c", names, dataX,
            dataY, lineX, lineY);
    }

    private static String report(Family family, Params p, Map<String, Parameter> freeKeys,
                                 Map<String, Object> raw,
                                 Observable observable, DataTable table, Measurements m,
                                 List<Curve> curves, boolean breakthrough, FitResult r,
                                 boolean evaluable) {
        final StringBuilder b = new StringBuilder();
        final Map<Parameter, String> keyOf = new EnumMap<>(Parameter.class);
        freeKeys.forEach((key, par) -> keyOf.put(par, key));
        b.append("Fit of family ").append(family.name()).append(" to ").append(table.source())
            .append('\n');
        b.append("  family: ").append(family.summary()).append('\n');
        b.append("  observed: ").append(observable == Observable.FLUX_AVERAGED
            ? "flux-averaged concentration" : "resident concentration").append('\n');
        final Set<String> names = new LinkedHashSet<>();
        for (Curve c : curves) {
            names.add(ParamSpec.format(c.fixed));
        }
        b.append(String.format(Locale.ROOT, "  data: %d rows in %d %s at %s = %s; weights %s%n",
            m.x.length, curves.size(), breakthrough
                ? (curves.size() == 1 ? "breakthrough curve" : "breakthrough curves")
                : (curves.size() == 1 ? "profile" : "profiles"),
            breakthrough ? "x" : "t", String.join(", ", names),
            m.w == null ? "equal" : "from column w"));
        final List<String> fixed = new ArrayList<>();
        for (ParamSpec spec : family.params()) {
            if (freeKeys.containsKey(spec.key())) {
                continue;
            }
            final String text = spec.isChoice() ? p.word(spec.key())
                : p.has(spec.key()) ? ParamSpec.format(p.get(spec.key())) : null;
            if (text != null) {
                fixed.add(spec.key() + " = " + text);
            }
        }
        b.append("  fixed: ").append(fixed.isEmpty() ? "(none)" : String.join(", ", fixed))
            .append('\n');
        final List<String> given = new ArrayList<>();
        final List<String> guessed = new ArrayList<>();
        for (String key : freeKeys.keySet()) {
            if (raw.containsKey(key)) {
                given.add(key + " = " + ParamSpec.format(p.get(key)));
            } else {
                guessed.add(key);
            }
        }
        final List<String> starts = new ArrayList<>();
        if (!given.isEmpty()) {
            starts.add("starting from " + String.join(", ", given));
        }
        if (!guessed.isEmpty()) {
            starts.add((given.isEmpty() ? "starting values of " : "")
                + String.join(", ", guessed) + " from the data's moments");
        }
        b.append("  free: ").append(String.join(", ", freeKeys.keySet())).append(" (")
            .append(String.join("; ", starts)).append(")\n");
        b.append(String.format(Locale.ROOT, "status: %s after %d iterations, %d model "
            + "evaluations%n", r.status(), r.iterations(), r.evaluations()));
        b.append("  ").append(Main.oneLine(r.message())).append("\n\n");

        final List<Parameter> order = r.freeParameters();
        if (r.isConverged()) {
            final List<String[]> rows = new ArrayList<>();
            rows.add(new String[] {"parameter", "estimate", "standard error", "lower 95 %",
                "upper 95 %"});
            for (Parameter par : order) {
                rows.add(new String[] {keyOf.get(par), Double.toString(r.value(par)),
                    Double.toString(r.standardError(par)), Double.toString(r.lower95(par)),
                    Double.toString(r.upper95(par))});
            }
            table(b, rows);
            b.append('\n').append("correlation of the estimates\n");
            final double[][] corr = r.correlation();
            final List<String[]> cr = new ArrayList<>();
            final String[] head = new String[order.size() + 1];
            head[0] = "";
            for (int j = 0; j < order.size(); j++) {
                head[j + 1] = keyOf.get(order.get(j));
            }
            cr.add(head);
            for (int i = 0; i < order.size(); i++) {
                final String[] row = new String[order.size() + 1];
                row[0] = keyOf.get(order.get(i));
                for (int j = 0; j < order.size(); j++) {
                    row[j + 1] = Double.toString(corr[i][j]);
                }
                cr.add(row);
            }
            table(b, cr);
            b.append('\n');
            b.append("R^2 = ").append(Double.toString(r.rSquared())).append('\n');
            b.append(String.format(Locale.ROOT, "residual standard error s = %s (%d degrees of "
                + "freedom)%n", Double.toString(r.residualStandardError()),
                m.x.length - order.size()));
        } else {
            final List<String[]> rows = new ArrayList<>();
            rows.add(new String[] {"parameter", "value reached (not an estimate: no standard "
                + "errors or intervals)"});
            for (Parameter par : order) {
                rows.add(new String[] {keyOf.get(par), Double.toString(r.value(par))});
            }
            table(b, rows);
            if (!evaluable) {
                b.append("\nThe model cannot be evaluated at these values: no fit.csv and no "
                    + "fitted curve in the plot.\n");
            }
        }
        return b.toString();
    }

    /**
     * Appends rows as left-aligned columns separated by two spaces (trailing spaces removed).
     *
     * @param b receives the lines
     * @param rows the rows, each with as many cells as the first
     */
    static void table(StringBuilder b, List<String[]> rows) {
        final int columns = rows.get(0).length;
        final int[] width = new int[columns];
        for (String[] row : rows) {
            for (int j = 0; j < columns; j++) {
                width[j] = Math.max(width[j], row[j].length());
            }
        }
        for (String[] row : rows) {
            final StringBuilder line = new StringBuilder();
            for (int j = 0; j < columns; j++) {
                line.append(row[j]);
                if (j < columns - 1) {
                    line.append(" ".repeat(width[j] - row[j].length() + 2));
                }
            }
            b.append(line.toString().stripTrailing()).append('\n');
        }
    }
}
