package org.advecta.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.function.DoubleSupplier;
import org.advecta.solution.Solution1D;
import org.advecta.verify.CellAverages;
import org.advecta.verify.ErrorNorms;
import org.advecta.verify.GridConvergenceIndex;
import org.advecta.verify.ObservedOrder;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code advecta check SIM.csv FAMILY key=value ...}: compares a simulator's values with a
 * family's exact solution and prints the error norms ({@link ErrorNorms}); given several
 * refinement levels, the observed order of accuracy ({@link ObservedOrder}) and, for three
 * levels, the grid convergence index ({@link GridConvergenceIndex}).
 */
@Command(name = "check", mixinStandardHelpOptions = true,
    customSynopsis = {"advecta check [OPTIONS] SIM.csv [SIM2.csv ...] FAMILY [KEY=VALUE ...]"},
    description = {
        "Compare a simulator's values with an exact solution: L1, L2 and Linf norms of the "
            + "error, absolute and relative.",
        "SIM.csv has the family's coordinate columns (x[, y, z], t) and c, the simulator's "
            + "values; with --cells, columns x_left, x_right, t and c (cell averages, 1-D "
            + "families). An optional column w (or cell-width) gives the weights of L1 and L2; "
            + "otherwise they are the cell widths with --cells and 1/n without. Other columns "
            + "are passed through to -o.",
        "With three or more files (the refinement levels, given before FAMILY or after "
            + "--refine) also the observed order of each norm, pairwise and by least squares, "
            + "and with exactly three the grid convergence index of phi = sum of w*c. The mesh "
            + "sizes come from --h or, without it, from the data: the mean cell width with "
            + "--cells, else the geometric mean over the axes of (max - min)/(points - 1) of "
            + "the distinct coordinates (a tensor-product grid; give --h otherwise)."},
    footer = {"", "Examples:",
        "  advecta check sim.csv gaussian v=1 D=0.01 s0=0.1",
        "  advecta check coarse.csv step v=1 D=0.01 --cells --refine mid.csv fine.csv"})
final class CheckCommand implements Callable<Integer> {

    /** The columns -o appends. */
    private static final List<String> APPENDED = List.of("exact", "error");

    private final Main.Io io;

    @Parameters(arity = "1..*", paramLabel = "ARGS",
        description = "SIM.csv [SIM2.csv ...] FAMILY [KEY=VALUE ...]")
    private List<String> arguments = new ArrayList<>();

    @Option(names = "--refine", arity = "1..*", paramLabel = "SIM.csv",
        description = "more refinement levels of the same problem")
    private List<String> refine = new ArrayList<>();

    @Option(names = "--h", paramLabel = "H1,H2,...",
        description = "mesh sizes of the files, in the order the files are given")
    private String spacings;

    @Option(names = "--cells",
        description = "c holds cell averages over x_left..x_right (1-D families)")
    private boolean cells;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
        description = "write the first file's rows with the exact values and the errors "
            + "(columns exact, error)")
    private Path output;

    /**
     * Creates the command.
     *
     * @param io the streams to use
     */
    CheckCommand(Main.Io io) {
        this.io = io;
    }

    /** One file compared with the exact solution. */
    private static final class Comparison {
        final DataTable table;
        final double[] computed;
        final double[] exact;
        final double[] weights;
        final ErrorNorms norms;
        final DoubleSupplier inferredSpacing;
        double h;

        Comparison(DataTable table, double[] computed, double[] exact, double[] weights,
                   DoubleSupplier inferredSpacing) {
            this.table = table;
            this.computed = computed;
            this.exact = exact;
            this.weights = weights;
            this.norms = ErrorNorms.of(computed, exact, weights);
            this.inferredSpacing = inferredSpacing;
        }
    }

    @Override
    public Integer call() {
        final List<String> pool = new ArrayList<>(arguments);
        pool.addAll(refine);
        final List<Path> files = new ArrayList<>();
        final List<String> keys = new ArrayList<>();
        Family family = null;
        final Set<String> familyNames = new LinkedHashSet<>();
        Families.ALL.forEach(f -> familyNames.add(f.name()));
        for (String a : pool) {
            if (a.contains("=")) {
                keys.add(a);
            } else if (familyNames.contains(a)) {
                if (family != null) {
                    throw new UserError("two families given: " + family.name() + " and " + a);
                }
                family = Families.find(a);
            } else {
                files.add(Path.of(a));
            }
        }
        if (family == null) {
            for (int i = files.size() - 1; i >= 0; i--) {
                if (!Files.exists(files.get(i))) {
                    Families.find(files.get(i).toString()); // throws: unknown family 'X'
                }
            }
            throw new UserError("missing FAMILY after the files (families: "
                + String.join(", ", familyNames) + ")");
        }
        if (files.isEmpty()) {
            throw new UserError("missing SIM.csv, the simulator's values");
        }
        final String name = family.name();
        final Params params = Params.of(family, EvalCommand.assignments(keys));
        final Field field = family.create(params);
        final Solution1D line = cells ? field.line().orElseThrow(() -> new UserError(
            "--cells: family " + name + " has no exact cell averages (only the 1-D solution "
                + "families: step, slug, gaussian, background, inlet-first, inlet-third)"))
            : null;
        if (files.size() == 2) {
            throw new UserError("an observed order needs at least three files (got 2: "
                + files.get(0) + ", " + files.get(1) + ")");
        }
        final double[] h = spacings == null ? null : spacings(spacings, files.size());

        final List<Comparison> all = new ArrayList<>();
        for (int k = 0; k < files.size(); k++) {
            final DataTable table = DataTable.read(files.get(k));
            if (k == 0 && output != null) {
                table.forbid(APPENDED, "clashes with a column -o appends (exact, error)");
            }
            all.add(cells ? compareCells(table, line, field) : comparePoints(table, field,
                family));
        }
        if (all.size() >= 3) {
            for (int k = 0; k < all.size(); k++) {
                all.get(k).h = h != null ? h[k] : all.get(k).inferredSpacing.getAsDouble();
            }
            coarsestFirst(all); // checks before anything is written
        }

        // Everything is computed and checked before the first output.
        final String text = all.size() == 1 ? single(all.get(0), family, params)
            : refinement(all, family, params, h != null);
        if (output != null) {
            final Comparison first = all.get(0);
            AtomicOutput.write(output, o -> writeTable(first, o));
        }
        io.out().print(text);
        if (output != null) {
            io.out().println();
            io.out().println("Wrote:");
            io.out().println("  " + output);
        }
        io.out().flush();
        return 0;
    }

    private static double[] spacings(String list, int files) {
        final String[] parts = list.split(",", -1);
        if (parts.length != files) {
            throw new UserError(String.format(Locale.ROOT,
                "--h %s: %d mesh sizes for %d files (give one per file, in the order of the "
                    + "files)", list, parts.length, files));
        }
        if (files < 3) {
            throw new UserError("--h: mesh sizes are for an order study of three or more files");
        }
        final double[] h = new double[parts.length];
        for (int k = 0; k < parts.length; k++) {
            final String s = parts[k].strip();
            if (!ParamSpec.isDecimal(s)) {
                throw new UserError("--h: '" + s + "' is not a number");
            }
            h[k] = Double.parseDouble(s);
            if (!(h[k] > 0 && h[k] < Double.POSITIVE_INFINITY)) {
                throw new UserError("--h: h = " + s + ": must be finite and > 0");
            }
        }
        return h;
    }

    private static double[] weightsColumn(DataTable table, int n) {
        final int iw = table.column("w");
        final int icw = table.column("cell-width");
        if (iw >= 0 && icw >= 0) {
            throw new UserError(table.source() + ": columns w and cell-width: give one weight "
                + "column");
        }
        final int col = iw >= 0 ? iw : icw;
        if (col < 0) {
            return null;
        }
        final double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = table.number(i, col);
            if (!(w[i] > 0)) {
                throw table.at(i, table.header().get(col) + " = " + ParamSpec.format(w[i])
                    + ": a weight must be > 0");
            }
        }
        return w;
    }

    private static Comparison comparePoints(DataTable table, Field field, Family family) {
        final List<String> coordinates = new ArrayList<>(family.coordinates());
        if (field.steady()) {
            // a steady state has no time: a t column, if any, is not read (as in eval)
            coordinates.remove("t");
        }
        final List<String> needed = new ArrayList<>(coordinates);
        needed.add("c");
        for (String axis : List.of("x", "y", "z")) {
            if (!coordinates.contains(axis) && table.column(axis) >= 0) {
                throw new UserError(table.source() + ": column " + axis + " is not a "
                    + "coordinate of a " + field.dimensions() + "D family (it needs "
                    + String.join(", ", coordinates) + ")");
            }
        }
        final int d = field.dimensions();
        final int[] col = new int[4];
        final String[] axes = {"x", "y", "z"};
        for (int a = 0; a < 3; a++) {
            col[a] = a < d ? table.required(axes[a], needed) : -1;
        }
        col[3] = field.steady() ? -1 : table.required("t", needed);
        final int ic = table.required("c", needed);
        final int n = rows(table);
        final double[][] p = new double[4][n];
        final double[] c = new double[n];
        final double[] exact = new double[n];
        for (int i = 0; i < n; i++) {
            for (int a = 0; a < 4; a++) {
                p[a][i] = col[a] < 0 ? 0.0 : table.number(i, col[a]);
            }
            checkTime(table, i, p[3][i]);
            checkX(table, i, p[0][i], field, "x");
            c[i] = table.number(i, ic);
            try {
                exact[i] = field.value(p[0][i], p[1][i], p[2][i], p[3][i]);
            } catch (IllegalArgumentException | IllegalStateException e) {
                throw table.at(i, e.getMessage());
            }
            checkExact(table, i, exact[i]);
        }
        final double[] w = weightsColumn(table, n);
        return new Comparison(table, c, exact, w, () -> pointSpacing(table, p, d));
    }

    private static Comparison compareCells(DataTable table, Solution1D line, Field field) {
        final List<String> needed = List.of("x_left", "x_right", "t", "c");
        table.forbid(List.of("y", "z"), "not a coordinate of a 1-D family");
        final int il = table.required("x_left", needed);
        final int ir = table.required("x_right", needed);
        final int it = table.required("t", needed);
        final int ic = table.required("c", needed);
        final int n = rows(table);
        final double[] c = new double[n];
        final double[] exact = new double[n];
        final double[] widths = new double[n];
        final double[][] faces = new double[2][n];
        for (int i = 0; i < n; i++) {
            final double a = table.number(i, il);
            final double b = table.number(i, ir);
            final double t = table.number(i, it);
            if (!(b > a)) {
                throw table.at(i, "x_right = " + ParamSpec.format(b) + ": must be > x_left = "
                    + ParamSpec.format(a));
            }
            checkTime(table, i, t);
            checkX(table, i, a, field, "x_left");
            c[i] = table.number(i, ic);
            try {
                exact[i] = CellAverages.average(line, a, b, t);
            } catch (IllegalArgumentException | IllegalStateException e) {
                throw table.at(i, e.getMessage());
            }
            checkExact(table, i, exact[i]);
            widths[i] = b - a;
            faces[0][i] = a;
            faces[1][i] = b;
        }
        final double[] w = weightsColumn(table, n);
        return new Comparison(table, c, exact, w == null ? widths : w,
            () -> cellSpacing(faces));
    }

    private static int rows(DataTable table) {
        if (table.size() == 0) {
            throw new UserError(table.source() + ": no data rows");
        }
        return table.size();
    }

    private static void checkTime(DataTable table, int i, double t) {
        if (!(t >= 0)) {
            throw table.at(i, "t = " + ParamSpec.format(t) + ": must be >= 0");
        }
    }

    private static void checkX(DataTable table, int i, double x, Field field, String name) {
        if (!(x >= field.minX())) {
            throw table.at(i, name + " = " + ParamSpec.format(x) + ": outside the half-line "
                + "x >= 0 of the family");
        }
    }

    private static void checkExact(DataTable table, int i, double exact) {
        if (!Double.isFinite(exact)) {
            throw table.at(i, "the exact value is " + exact + " here (a release point at "
                + "t = 0?); leave the point out");
        }
    }

    /** Geometric mean over the axes of (max − min)/(distinct values − 1). */
    private static double pointSpacing(DataTable table, double[][] p, int d) {
        double product = 1;
        int axes = 0;
        for (int a = 0; a < d; a++) {
            final double[] v = Arrays.stream(p[a]).map(x -> x + 0.0).distinct().sorted()
                .toArray();
            if (v.length >= 2) {
                product *= (v[v.length - 1] - v[0]) / (v.length - 1);
                axes++;
            }
        }
        if (axes == 0) {
            throw new UserError(table.source() + ": cannot infer a mesh size (a single point "
                + "in space); give --h");
        }
        return axes == 1 ? product : Math.pow(product, 1.0 / axes);
    }

    /** Mean width of the distinct cells. */
    private static double cellSpacing(double[][] faces) {
        final Set<List<Double>> seen = new LinkedHashSet<>();
        double sum = 0;
        for (int i = 0; i < faces[0].length; i++) {
            if (seen.add(List.of(faces[0][i] + 0.0, faces[1][i] + 0.0))) {
                sum += faces[1][i] - faces[0][i];
            }
        }
        return sum / seen.size();
    }

    private static void writeTable(Comparison cmp, OutputStream sink) throws IOException {
        final Writer w = new BufferedWriter(new OutputStreamWriter(sink, StandardCharsets.UTF_8));
        final List<String> header = new ArrayList<>(cmp.table.header());
        header.addAll(APPENDED);
        EvalCommand.FORMAT.printRecord(w, header.toArray());
        final List<String> row = new ArrayList<>();
        for (int i = 0; i < cmp.table.size(); i++) {
            row.clear();
            row.addAll(cmp.table.row(i));
            row.add(Double.toString(cmp.exact[i]));
            row.add(Double.toString(cmp.computed[i] - cmp.exact[i]));
            EvalCommand.FORMAT.printRecord(w, row.toArray());
        }
        w.flush();
    }

    private String heading(Family family, Params params, int files) {
        return "Check " + (files == 1 ? "" : "of " + files + " refinement levels ")
            + "against family " + family.name() + " (" + params.describe() + ")\n";
    }

    private String weightsText(Comparison c) {
        if (c.table.column("w") >= 0) {
            return "weights from column w";
        }
        if (c.table.column("cell-width") >= 0) {
            return "weights from column cell-width";
        }
        return cells ? "weights the cell widths" : "weights equal (1/n)";
    }

    private String single(Comparison c, Family family, Params params) {
        final StringBuilder b = new StringBuilder(heading(family, params, 1));
        b.append(String.format(Locale.ROOT, "  %s: %d %s, %s%n", c.table.source(),
            c.computed.length, cells ? "cell averages" : "point values", weightsText(c)));
        final List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"norm", "absolute", "relative"});
        rows.add(new String[] {"L1", Double.toString(c.norms.l1()),
            relative(c.norms::relativeL1)});
        rows.add(new String[] {"L2", Double.toString(c.norms.l2()),
            relative(c.norms::relativeL2)});
        rows.add(new String[] {"Linf", Double.toString(c.norms.lInf()),
            relative(c.norms::relativeLInf)});
        FitCommand.table(b, rows);
        return b.toString();
    }

    private static String relative(DoubleSupplier r) {
        try {
            return Double.toString(r.getAsDouble());
        } catch (IllegalStateException e) {
            return "undefined (the exact values are all 0)";
        }
    }

    private String refinement(List<Comparison> all, Family family, Params params,
                              boolean given) {
        final StringBuilder b = new StringBuilder(heading(family, params, all.size()));
        b.append(String.format(Locale.ROOT, "  %s, %s; mesh sizes %s%n",
            cells ? "cell averages" : "point values", weightsText(all.get(0)),
            given ? "from --h" : "inferred from the coordinates"));
        final List<Comparison> sorted = coarsestFirst(all);
        final List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"file", "h", "n", "L1", "L2", "Linf", "relative L1",
            "relative L2", "relative Linf"});
        for (Comparison c : sorted) {
            rows.add(new String[] {c.table.source(), Double.toString(c.h),
                Integer.toString(c.computed.length), Double.toString(c.norms.l1()),
                Double.toString(c.norms.l2()), Double.toString(c.norms.lInf()),
                relative(c.norms::relativeL1), relative(c.norms::relativeL2),
                relative(c.norms::relativeLInf)});
        }
        b.append('\n');
        FitCommand.table(b, rows);

        final double[] h = new double[sorted.size()];
        for (int k = 0; k < h.length; k++) {
            h[k] = sorted.get(k).h;
        }
        b.append("\nObserved order (coarsest to finest; pairwise between consecutive levels)\n");
        final List<String[]> orders = new ArrayList<>();
        orders.add(new String[] {"norm", "pairwise", "least squares", "standard error"});
        final String[] names = {"L1", "L2", "Linf"};
        for (int j = 0; j < 3; j++) {
            final double[] e = new double[sorted.size()];
            for (int k = 0; k < e.length; k++) {
                final ErrorNorms n = sorted.get(k).norms;
                e[k] = j == 0 ? n.l1() : j == 1 ? n.l2() : n.lInf();
            }
            orders.add(order(names[j], h, e, sorted));
        }
        FitCommand.table(b, orders);
        if (sorted.size() == 3) {
            gci(b, sorted);
        }
        return b.toString();
    }

    /** The levels sorted by decreasing mesh size, checked to be all different. */
    private static List<Comparison> coarsestFirst(List<Comparison> all) {
        final List<Comparison> sorted = new ArrayList<>(all);
        sorted.sort(Comparator.comparingDouble((Comparison c) -> c.h).reversed());
        for (int k = 0; k + 1 < sorted.size(); k++) {
            if (sorted.get(k).h == sorted.get(k + 1).h) {
                throw new UserError(sorted.get(k).table.source() + " and "
                    + sorted.get(k + 1).table.source() + " have the same mesh size h = "
                    + Double.toString(sorted.get(k).h) + "; an order needs different sizes");
            }
        }
        return sorted;
    }

    private static String[] order(String name, double[] h, double[] e, List<Comparison> files) {
        for (int k = 0; k < e.length; k++) {
            if (!(e[k] > 0)) {
                return new String[] {name, "undefined: the error is 0 in "
                    + files.get(k).table.source(), "", ""};
            }
        }
        final ObservedOrder o = ObservedOrder.of(h, e);
        final StringBuilder pairs = new StringBuilder();
        for (double p : o.pairwise()) {
            pairs.append(pairs.length() == 0 ? "" : ", ").append(Double.toString(p));
        }
        return new String[] {name, pairs.toString(), Double.toString(o.leastSquares()),
            Double.toString(o.leastSquaresStandardError())};
    }

    /** Σ wᵢcᵢ, with wᵢ = 1/n where no weights are given. */
    private static double weightedSum(double[] c, double[] w) {
        double sum = 0;
        double comp = 0;
        for (int i = 0; i < c.length; i++) {
            final double term = w == null ? c[i] / c.length : w[i] * c[i];
            final double t = sum + term;
            comp += Math.abs(sum) >= Math.abs(term) ? (sum - t) + term : (term - t) + sum;
            sum = t;
        }
        return sum + comp;
    }

    private void gci(StringBuilder b, List<Comparison> sorted) {
        // sorted is coarsest first; the index numbers grids from the finest.
        final Comparison fine = sorted.get(2);
        final Comparison mid = sorted.get(1);
        final Comparison coarse = sorted.get(0);
        final double phi1 = weightedSum(fine.computed, fine.weights);
        final double phi2 = weightedSum(mid.computed, mid.weights);
        final double phi3 = weightedSum(coarse.computed, coarse.weights);
        b.append("\nGrid convergence index of phi = sum of w*c (Celik et al. 2008 procedure)\n");
        final List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"phi", "coarse", Double.toString(phi3)});
        rows.add(new String[] {"", "middle", Double.toString(phi2)});
        rows.add(new String[] {"", "fine", Double.toString(phi1)});
        rows.add(new String[] {"exact phi", "fine", Double.toString(
            weightedSum(fine.exact, fine.weights))});
        try {
            final GridConvergenceIndex g = GridConvergenceIndex.of(fine.h, mid.h, coarse.h,
                phi1, phi2, phi3);
            rows.add(new String[] {"apparent order", "", Double.toString(g.order())});
            rows.add(new String[] {"extrapolated phi", "", Double.toString(g.extrapolated())});
            rows.add(new String[] {"approximate relative error", "fine", Double.toString(
                g.approximateRelativeError())});
            rows.add(new String[] {"extrapolated relative error", "fine", Double.toString(
                g.extrapolatedRelativeError())});
            rows.add(new String[] {"GCI", "fine", Double.toString(g.fineGridIndex())
                + " (safety factor " + ParamSpec.format(g.safetyFactor()) + ")"});
            if (g.isOscillatory()) {
                rows.add(new String[] {"note", "", "oscillatory convergence: order and GCI "
                    + "are less reliable"});
            }
        } catch (IllegalArgumentException e) {
            rows.add(new String[] {"GCI", "", "not available: " + e.getMessage()});
        }
        FitCommand.table(b, rows);
    }
}
