package org.advecta.cli;

import java.io.OutputStreamWriter;
import java.io.PrintStream;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.jfree.chart.JFreeChart;

/**
 * Computes what a {@link Scenario} asks for, then writes its tables, plots and summary.
 * Everything is computed before the first file is written.
 */
final class Runner {

    /** Below this many evaluations a run is short and shows no progress. */
    static final long PROGRESS_THRESHOLD = 100_000;

    private static final double GOLDEN = (Math.sqrt(5) - 1) / 2;

    /** The summary's note where a mass balance would be: none for a continuous source. */
    static final String CONTINUOUS = "  (no mass balance: a continuous source keeps releasing "
        + "solute, so there is no fixed amount to compare a window's integral with)\n";

    private final Scenario s;
    private final PrintStream progressTo;
    private final long total;
    private long done;
    private int shownDecile;

    private double[][] profiles;
    private double[][] curves;
    private double[][] plan;

    /**
     * Prepares a run.
     *
     * @param scenario the validated scenario
     * @param progressTo where to show progress on long runs, or null for none
     */
    Runner(Scenario scenario, PrintStream progressTo) {
        this.s = scenario;
        this.progressTo = progressTo;
        long n = 0;
        if (s.profiles != null) {
            n += (long) s.profiles.times.length * s.profiles.x.points();
        }
        if (s.breakthrough != null) {
            n += (long) s.breakthrough.at.size() * s.breakthrough.t.points();
        }
        if (s.plan != null) {
            n += (long) s.plan.x.points() * s.plan.y.points();
        }
        this.total = n;
    }

    /** Evaluates every profile, curve and plan-view cell. */
    void compute() {
        if (progressTo != null && total >= PROGRESS_THRESHOLD) {
            progressTo.printf(Locale.ROOT, "advecta run: computing %d values%n", total);
        }
        final Field f = s.field;
        if (s.profiles != null) {
            final Scenario.Profiles p = s.profiles;
            profiles = new double[p.times.length][p.x.points()];
            for (int k = 0; k < p.times.length; k++) {
                for (int i = 0; i < p.x.points(); i++) {
                    profiles[k][i] = f.value(p.x.at(i), p.y, p.z, p.times[k]);
                }
                advance(p.x.points());
            }
        }
        if (s.breakthrough != null) {
            final Scenario.Breakthrough b = s.breakthrough;
            curves = new double[b.at.size()][b.t.points()];
            for (int k = 0; k < b.at.size(); k++) {
                final Scenario.Probe q = b.at.get(k);
                for (int i = 0; i < b.t.points(); i++) {
                    curves[k][i] = f.value(q.x, q.y, q.z, b.t.at(i));
                }
                advance(b.t.points());
            }
        }
        if (s.plan != null) {
            final Scenario.Plan p = s.plan;
            plan = new double[p.y.points()][p.x.points()];
            for (int j = 0; j < p.y.points(); j++) {
                for (int i = 0; i < p.x.points(); i++) {
                    plan[j][i] = f.value(p.x.at(i), p.y.at(j), p.z, p.time);
                }
                advance(p.x.points());
            }
        }
    }

    private void advance(int values) {
        done += values;
        if (progressTo == null || total < PROGRESS_THRESHOLD) {
            return;
        }
        final int decile = (int) (10 * done / total);
        if (decile > shownDecile) {
            shownDecile = decile;
            progressTo.printf(Locale.ROOT, "advecta run: %d%%%n", 10 * decile);
        }
    }

    /**
     * Writes the tables, plots and summary, each file atomically.
     *
     * @param dir the output folder (exists)
     * @param format the plots' format
     * @return the files written
     */
    List<Path> write(Path dir, Plots.Format format) {
        final List<Path> written = new ArrayList<>();
        final String ext = "." + format.extension();
        final String c = "c [" + s.concentration + "]";
        if (profiles != null) {
            final Scenario.Profiles p = s.profiles;
            final Path csv = dir.resolve("profiles.csv");
            AtomicOutput.write(csv, out -> {
                final Writer printer = printer(out);
                record(printer, header(false));
                for (int k = 0; k < p.times.length; k++) {
                    for (int i = 0; i < p.x.points(); i++) {
                        record(printer, row(null, p.x.at(i), p.y, p.z, p.times[k],
                            profiles[k][i]));
                    }
                }
                printer.flush();
            });
            written.add(csv);
            final List<String> names = new ArrayList<>();
            for (double t : p.times) {
                names.add(when(t));
            }
            final Path plot = dir.resolve("profiles" + ext);
            Plots.write(Plots.curves(s.title + ": profiles" + across(p.y, p.z),
                "x [" + s.length + "]", c, names, p.x.values(), profiles, s.level,
                levelLabel()), plot, format);
            written.add(plot);
        }
        if (curves != null) {
            final Scenario.Breakthrough b = s.breakthrough;
            final Path csv = dir.resolve("breakthrough.csv");
            AtomicOutput.write(csv, out -> {
                final Writer printer = printer(out);
                record(printer, header(true));
                for (int k = 0; k < b.at.size(); k++) {
                    final Scenario.Probe q = b.at.get(k);
                    for (int i = 0; i < b.t.points(); i++) {
                        record(printer, row(q.name, q.x, q.y, q.z, b.t.at(i), curves[k][i]));
                    }
                }
                printer.flush();
            });
            written.add(csv);
            final List<String> names = new ArrayList<>();
            for (Scenario.Probe q : b.at) {
                names.add(q.name + " " + where(q.x, q.y, q.z));
            }
            final Path plot = dir.resolve("breakthrough" + ext);
            Plots.write(Plots.curves(s.title + ": breakthrough curves", "t [" + s.time + "]", c,
                names, b.t.values(), curves, s.level, levelLabel()), plot, format);
            written.add(plot);
        }
        if (plan != null) {
            final Scenario.Plan p = s.plan;
            final Path csv = dir.resolve("plan.csv");
            AtomicOutput.write(csv, out -> {
                final Writer printer = printer(out);
                record(printer, header(false));
                for (int j = 0; j < p.y.points(); j++) {
                    for (int i = 0; i < p.x.points(); i++) {
                        record(printer, row(null, p.x.at(i), p.y.at(j), p.z, p.time,
                            plan[j][i]));
                    }
                }
                printer.flush();
            });
            written.add(csv);
            final Path plot = dir.resolve("plan" + ext);
            final JFreeChart chart = Plots.plan(s.title + ": plan view at " + when(p.time)
                    + (s.family.dimensions() == 3 ? ", z = " + num(p.z) : ""),
                "x [" + s.length + "]", "y [" + s.length + "]", c, p.x, p.y, plan);
            Plots.write(chart, plot, format);
            written.add(plot);
        }
        final Path summary = dir.resolve("summary.txt");
        final String text = summary();
        AtomicOutput.write(summary, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
        written.add(summary);
        return written;
    }

    private static void record(Writer out, List<String> values) throws java.io.IOException {
        EvalCommand.FORMAT.printRecord(out, values.toArray());
    }

    private static Writer printer(java.io.OutputStream out) {
        return new java.io.BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8));
    }

    private List<String> header(boolean named) {
        final List<String> h = new ArrayList<>();
        if (named) {
            h.add("point");
        }
        h.addAll(s.family.coordinates());
        if (s.field.steady()) {
            h.remove("t");
        }
        h.add("c");
        return h;
    }

    private List<String> row(String name, double x, double y, double z, double t, double c) {
        final List<String> r = new ArrayList<>(6);
        if (name != null) {
            r.add(name);
        }
        final int d = s.family.dimensions();
        r.add(Double.toString(x));
        if (d >= 2) {
            r.add(Double.toString(y));
        }
        if (d >= 3) {
            r.add(Double.toString(z));
        }
        if (!s.field.steady()) {
            r.add(Double.toString(t));
        }
        r.add(Double.toString(c));
        return r;
    }

    /** "t = 30 d", or "steady state". */
    private String when(double t) {
        return s.field.steady() ? "steady state" : "t = " + num(t) + " " + s.time;
    }

    private String levelLabel() {
        return s.level == null ? null : "level " + num(s.level) + " " + s.concentration;
    }

    private String across(double y, double z) {
        final int d = s.family.dimensions();
        return d == 1 ? "" : d == 2 ? " at y = " + num(y) + " " + s.length
            : " at y = " + num(y) + ", z = " + num(z) + " " + s.length;
    }

    private String where(double x, double y, double z) {
        final int d = s.family.dimensions();
        return "(" + num(x) + (d >= 2 ? ", " + num(y) : "") + (d >= 3 ? ", " + num(z) : "")
            + ")";
    }

    /**
     * Returns the text summary: the scenario, then peaks and arrival times of the
     * breakthrough curves, maxima and mass balance of the profiles and the plan view.
     *
     * @return the summary, several lines
     */
    String summary() {
        final StringBuilder b = new StringBuilder();
        b.append(s.title).append('\n');
        b.append("family ").append(s.family.name()).append(": ").append(s.family.summary())
            .append('\n');
        b.append("parameters: ").append(s.params.describe()).append('\n');
        b.append("units: length ").append(s.length).append(", time ").append(s.time)
            .append(", concentration ").append(s.concentration).append('\n');
        if (curves != null) {
            breakthroughSummary(b);
        }
        if (profiles != null) {
            profileSummary(b);
        }
        if (plan != null) {
            planSummary(b);
        }
        return b.toString();
    }

    private void breakthroughSummary(StringBuilder b) {
        final Scenario.Breakthrough bt = s.breakthrough;
        b.append('\n').append(String.format(Locale.ROOT,
            "Breakthrough curves, t = %s to %s %s (%d samples; %s refined on "
                + "the exact solution between samples)%n",
            num(bt.t.from()), num(bt.t.to()), s.time, bt.t.points(),
            s.field.continuousSource() ? "arrivals" : "peaks and arrivals"));
        for (int k = 0; k < bt.at.size(); k++) {
            final Scenario.Probe q = bt.at.get(k);
            final double[] c = curves[k];
            int best = 0;
            for (int i = 1; i < c.length; i++) {
                if (c[i] > c[best]) {
                    best = i;
                }
            }
            b.append(String.format(Locale.ROOT, "  %s at %s %s:%n", q.name,
                where(q.x, q.y, q.z), s.length));
            if (s.field.continuousSource()) {
                continuousCurve(b, q, bt.t, c);
                continue;
            }
            final double[] peak = peak(q, bt.t, best, c[best]);
            String note = "";
            if (best == 0) {
                note = " (at the start of the window)";
            } else if (best == c.length - 1) {
                note = " (at the end of the window: still rising)";
            }
            b.append(String.format(Locale.ROOT, "    peak c = %s %s at t = %s %s%s%n",
                num(peak[1]), s.concentration, num(peak[0]), s.time, note));
            if (s.level != null) {
                b.append("    c first reaches ").append(num(s.level)).append(' ')
                    .append(s.concentration).append(": ").append(arrival(q, bt.t, c))
                    .append('\n');
            }
        }
    }

    /**
     * A continuous source's curve rises towards its steady state (without a rate change there
     * is no peak to report): c at the end of the window, the steady state and the arrival.
     */
    private void continuousCurve(StringBuilder b, Scenario.Probe q, Grid t, double[] c) {
        final double last = c[c.length - 1];
        b.append(String.format(Locale.ROOT, "    c = %s %s at the end of the window (t = %s %s)",
            num(last), s.concentration, num(t.to()), s.time));
        final OptionalDouble steady = s.field.steadyValue(q.x, q.y, q.z);
        if (steady.isPresent()) {
            final double cs = steady.getAsDouble();
            b.append(String.format(Locale.ROOT, "; steady state c = %s %s", num(cs),
                s.concentration));
            if (cs != 0) {
                b.append(String.format(Locale.ROOT, " (%s %% of it reached)",
                    num(100 * last / cs)));
            }
        } else {
            b.append("; no steady state (v = 0 and mu = 0: c keeps growing)");
        }
        b.append('\n');
        if (s.level != null) {
            b.append("    c first reaches ").append(num(s.level)).append(' ')
                .append(s.concentration).append(": ").append(arrival(q, t, c)).append('\n');
        }
    }

    /** The peak (t, c) near sample i, refined by golden-section search between neighbours. */
    private double[] peak(Scenario.Probe q, Grid t, int i, double sampled) {
        if (i == 0 || i == t.points() - 1) {
            return new double[] {t.at(i), sampled};
        }
        double a = t.at(i - 1);
        double d = t.at(i + 1);
        double b = d - GOLDEN * (d - a);
        double c = a + GOLDEN * (d - a);
        double fb = value(q, b);
        double fc = value(q, c);
        for (int it = 0; it < 200 && b < c; it++) {
            if (fb >= fc) {
                d = c;
                c = b;
                fc = fb;
                b = d - GOLDEN * (d - a);
                fb = value(q, b);
            } else {
                a = b;
                b = c;
                fb = fc;
                c = a + GOLDEN * (d - a);
                fc = value(q, c);
            }
        }
        final double tBest = fb >= fc ? b : c;
        final double cBest = Math.max(fb, fc);
        return cBest >= sampled ? new double[] {tBest, cBest} : new double[] {t.at(i), sampled};
    }

    /** When c first reaches the level, refined by bisection between the bracketing samples. */
    private String arrival(Scenario.Probe q, Grid t, double[] c) {
        final double level = s.level;
        if (c[0] >= level) {
            return "already at t = " + num(t.at(0)) + " " + s.time;
        }
        for (int i = 1; i < c.length; i++) {
            if (c[i] >= level) {
                double lo = t.at(i - 1);
                double hi = t.at(i);
                for (int it = 0; it < 200; it++) {
                    final double mid = 0.5 * (lo + hi);
                    if (!(mid > lo && mid < hi)) {
                        break;
                    }
                    if (value(q, mid) >= level) {
                        hi = mid;
                    } else {
                        lo = mid;
                    }
                }
                return "t = " + num(hi) + " " + s.time;
            }
        }
        return "not within the window";
    }

    private double value(Scenario.Probe q, double t) {
        return s.field.value(q.x, q.y, q.z, t);
    }

    private void profileSummary(StringBuilder b) {
        final Scenario.Profiles p = s.profiles;
        final boolean balance = s.family.dimensions() == 1;
        b.append('\n').append(String.format(Locale.ROOT,
            "Profiles along x = %s to %s %s%s (%d samples)%n", num(p.x.from()), num(p.x.to()),
            s.length, across(p.y, p.z), p.x.points()));
        final double[] x = p.x.values();
        for (int k = 0; k < p.times.length; k++) {
            final double[] c = profiles[k];
            int best = 0;
            for (int i = 1; i < c.length; i++) {
                if (c[i] > c[best]) {
                    best = i;
                }
            }
            b.append(String.format(Locale.ROOT, "  %s: max c = %s %s at x = %s %s%n",
                when(p.times[k]), num(c[best]), s.concentration, num(x[best]), s.length));
            if (balance) {
                final double bg = s.field.background(p.times[k]);
                final double inWindow = trapezoid(x, c, bg);
                massLine(b, "integral of c" + (bg != 0 ? " - background" : "") + " dx",
                    inWindow, s.field.mass(p.times[k]), s.concentration + " " + s.length);
            }
        }
        if (s.field.continuousSource()) {
            b.append(CONTINUOUS);
        } else if (!balance) {
            b.append("  (mass balance: see the plan view; a profile is a line through a "
                + s.family.dimensions() + "D field)\n");
        }
    }

    private void planSummary(StringBuilder b) {
        final Scenario.Plan p = s.plan;
        b.append('\n').append(String.format(Locale.ROOT,
            "Plan view at %s%s, x = %s to %s, y = %s to %s %s (%d x %d cells)%n",
            when(p.time), s.family.dimensions() == 3 ? ", z = " + num(p.z) : "",
            num(p.x.from()), num(p.x.to()), num(p.y.from()), num(p.y.to()), s.length,
            p.x.points(), p.y.points()));
        int bi = 0;
        int bj = 0;
        for (int j = 0; j < p.y.points(); j++) {
            for (int i = 0; i < p.x.points(); i++) {
                if (plan[j][i] > plan[bj][bi]) {
                    bi = i;
                    bj = j;
                }
            }
        }
        b.append(String.format(Locale.ROOT, "  max c = %s %s at (%s, %s) %s%n",
            num(plan[bj][bi]), s.concentration, num(p.x.at(bi)), num(p.y.at(bj)), s.length));
        if (s.field.continuousSource()) {
            b.append(CONTINUOUS);
        } else if (s.family.dimensions() == 2) {
            final double[] x = p.x.values();
            final double[] y = p.y.values();
            final double[] rows = new double[p.y.points()];
            final double bg = s.field.background(p.time);
            for (int j = 0; j < rows.length; j++) {
                rows[j] = trapezoid(x, plan[j], bg);
            }
            massLine(b, "integral of c dx dy", trapezoid(y, rows, 0.0), s.field.mass(p.time),
                s.concentration + " " + s.length + "^2");
        } else {
            b.append("  (no mass balance for a slice through a 3D field)\n");
        }
    }

    private static void massLine(StringBuilder b, String what, double inWindow,
                                 OptionalDouble exact, String unit) {
        b.append(String.format(Locale.ROOT, "    mass balance: %s over the window = %s %s",
            what, num(inWindow), unit));
        if (exact.isPresent()) {
            final double e = exact.getAsDouble();
            b.append(String.format(Locale.ROOT, "; exact over the whole domain = %s", num(e)));
            if (e != 0) {
                b.append(String.format(Locale.ROOT, " (relative difference %.2e)",
                    (inWindow - e) / e));
            }
        } else {
            b.append(" (this family has no finite closed-form total)");
        }
        b.append('\n');
    }

    /** ∫(c − bg) over the samples by the trapezoidal rule, with a compensated sum. */
    private static double trapezoid(double[] x, double[] c, double bg) {
        double sum = 0;
        double comp = 0;
        for (int i = 1; i < x.length; i++) {
            final double term = 0.5 * (x[i] - x[i - 1]) * ((c[i] - bg) + (c[i - 1] - bg));
            final double t = sum + term;
            comp += Math.abs(sum) >= Math.abs(term) ? (sum - t) + term : (term - t) + sum;
            sum = t;
        }
        return sum + comp;
    }

    /**
     * Formats a number for people: six significant digits, no trailing zeros, plain notation
     * from 1e-4 to 1e7 and scientific notation outside.
     *
     * @param v the number
     * @return the text
     */
    static String num(double v) {
        if (v == 0 || !Double.isFinite(v)) {
            return v == 0 ? "0" : Double.toString(v);
        }
        final String s = new java.math.BigDecimal(v).round(new java.math.MathContext(6))
            .stripTrailingZeros().toPlainString();
        final double a = Math.abs(v);
        if (a >= 1e-4 && a < 1e7) {
            return s;
        }
        return String.format(Locale.ROOT, "%.5e", v).replaceAll("0+e", "e").replace(".e", "e");
    }
}
