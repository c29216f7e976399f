package org.advecta.cli;

import com.fasterxml.jackson.core.JacksonException;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.dataformat.toml.TomlMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * A scenario file (TOML), read and validated as a whole before anything is computed: the
 * family, the medium, the source (initial data or inlet), the units' labels and what to
 * report. Immutable.
 *
 * <pre>
 * title = "..."                      # optional
 * family = "release-2d"              # see 'advecta list'
 * [units]                            # optional labels: length, time, concentration
 * [medium]                           # v, D (and DT, DV), R, mu
 * [source]                           # the family's own keys: source, initial data or inlet
 * [profiles]    times = [...], x = {from, to, points}, y = ..., z = ...
 * [breakthrough] t = {from, to, points}, [[breakthrough.at]] name, x, y, z
 * [plan]        time = ..., x = {from, to, points}, y = {from, to, points}, z = ...
 * [summary]     level = ...          # optional: report when c first reaches it
 * </pre>
 */
final class Scenario {

    /** Largest number of samples along one grid. */
    static final int MAX_POINTS = 100_000;
    /** Largest number of cells of a plan view. */
    static final int MAX_CELLS = 1_000_000;

    private static final Set<String> MEDIUM_KEYS = Set.of("v", "D", "DT", "DV", "R", "mu");

    /** Profiles along x at fixed times (and fixed y, z for 2D and 3D families). */
    static final class Profiles {
        /** The times, each &gt; 0 (not copied: the scenario owns the array). */
        final double[] times;
        /** The positions along x. */
        final Grid x;
        /** The fixed y (2D, 3D; 0 otherwise). */
        final double y;
        /** The fixed z (3D; 0 otherwise). */
        final double z;

        /**
         * Bundles a validated profiles section.
         *
         * @param times the times
         * @param x the positions along x
         * @param y the fixed y
         * @param z the fixed z
         */
        Profiles(double[] times, Grid x, double y, double z) {
            this.times = times;
            this.x = x;
            this.y = y;
            this.z = z;
        }
    }

    /** A named observation point. */
    static final class Probe {
        /** The name in tables, plots and the summary. */
        final String name;
        /** Position along the flow. */
        final double x;
        /** Position across the flow (2D, 3D; 0 otherwise). */
        final double y;
        /** Position in the third direction (3D; 0 otherwise). */
        final double z;

        /**
         * Creates a validated point.
         *
         * @param name the name
         * @param x position along the flow
         * @param y position across the flow
         * @param z position in the third direction
         */
        Probe(String name, double x, double y, double z) {
            this.name = name;
            this.x = x;
            this.y = y;
            this.z = z;
        }
    }

    /** Breakthrough curves: c against t at observation points. */
    static final class Breakthrough {
        /** The times, from ≥ 0. */
        final Grid t;
        /** The points, at least one. */
        final List<Probe> at;

        /**
         * Bundles a validated breakthrough section.
         *
         * @param t the times
         * @param at the points
         */
        Breakthrough(Grid t, List<Probe> at) {
            this.t = t;
            this.at = Collections.unmodifiableList(at);
        }
    }

    /** A plan view: c over an x–y grid at one time (and fixed z for 3D families). */
    static final class Plan {
        /** The time, &gt; 0. */
        final double time;
        /** The grid along x. */
        final Grid x;
        /** The grid along y. */
        final Grid y;
        /** The fixed z (3D; 0 otherwise). */
        final double z;

        /**
         * Bundles a validated plan section.
         *
         * @param time the time
         * @param x the grid along x
         * @param y the grid along y
         * @param z the fixed z
         */
        Plan(double time, Grid x, Grid y, double z) {
            this.time = time;
            this.x = x;
            this.y = y;
            this.z = z;
        }
    }

    /** The title for plots and the summary (the file's name without .toml by default). */
    final String title;
    /** The family. */
    final Family family;
    /** Its validated parameters, from [medium] and [source]. */
    final Params params;
    /** The field to evaluate. */
    final Field field;
    /** The label of the length unit. */
    final String length;
    /** The label of the time unit. */
    final String time;
    /** The label of the concentration unit. */
    final String concentration;
    /** The profiles to compute, or null. */
    final Profiles profiles;
    /** The breakthrough curves to compute, or null. */
    final Breakthrough breakthrough;
    /** The plan view to compute, or null. */
    final Plan plan;
    /** The level whose arrival the summary reports, or null. */
    final Double level;

    private Scenario(Table root, String name) {
        root.expect("title", "family", "units", "medium", "source", "profiles", "breakthrough",
            "plan", "summary");
        final String familyName = root.string("family", null);
        if (familyName == null) {
            throw root.error("family", "missing (e.g. family = \"release-2d\"; see 'advecta list')");
        }
        try {
            this.family = Families.find(familyName);
        } catch (UserError e) {
            throw root.error("family", e.getMessage());
        }
        this.title = root.string("title", name);
        final Table units = root.table("units", false).expect("length", "time", "concentration");
        this.length = units.string("length", "L");
        this.time = units.string("time", "T");
        this.concentration = units.string("concentration", "C");
        units.finish();

        final Map<String, Object> raw = new LinkedHashMap<>();
        final Table medium = root.table("medium", true);
        for (String key : medium.keys()) {
            if (!MEDIUM_KEYS.contains(key)) {
                throw medium.error(key, "not a property of the medium (the medium has "
                    + "v, D, DT, DV, R, mu; the family's own keys go in [source])");
            }
            raw.put(key, medium.scalar(key));
        }
        final Table source = root.table("source", false);
        for (String key : source.keys()) {
            if (MEDIUM_KEYS.contains(key)) {
                throw source.error(key, "belongs in [medium]");
            }
            raw.put(key, source.scalar(key));
        }
        try {
            this.params = Params.of(family, raw);
            this.field = family.create(params);
        } catch (UserError e) {
            throw new UserError(root.file + ": " + e.getMessage(), e);
        }

        final int d = family.dimensions();
        final boolean steady = field.steady();
        final Table p = root.table("profiles", false).expect("times", "x", "y", "z");
        if (p.isPresent()) {
            final double[] times = steady ? steadyTime(p, "times") : p.numbers("times");
            for (int i = 0; i < times.length; i++) {
                if (!(times[i] > 0)) {
                    throw p.error("times", "t = " + ParamSpec.format(times[i])
                        + ": must be > 0");
                }
            }
            final Grid x = p.grid("x");
            requireDomain(p, "x", x.from());
            this.profiles = new Profiles(times, x, p.coordinate("y", d >= 2),
                p.coordinate("z", d >= 3));
        } else {
            this.profiles = null;
        }
        p.finish();

        final Table b = root.table("breakthrough", false).expect("t", "at");
        if (b.isPresent() && steady) {
            throw root.error("breakthrough", "no breakthrough curves for a steady state "
                + "(steady = true: c does not change in time)");
        }
        if (b.isPresent()) {
            final Grid t = b.grid("t");
            if (!(t.from() >= 0)) {
                throw b.error("t", "from = " + ParamSpec.format(t.from()) + ": must be >= 0");
            }
            final List<Table> at = b.tables("at");
            final List<Probe> probes = new ArrayList<>();
            for (int i = 0; i < at.size(); i++) {
                final Table a = at.get(i).expect("name", "x", "y", "z");
                final double x = a.number("x");
                requireDomain(a, "x", x);
                probes.add(new Probe(a.string("name", "P" + (i + 1)), x,
                    a.coordinate("y", d >= 2), a.coordinate("z", d >= 3)));
                a.finish();
            }
            this.breakthrough = new Breakthrough(t, probes);
        } else {
            this.breakthrough = null;
        }
        b.finish();

        final Table v = root.table("plan", false).expect("time", "x", "y", "z");
        if (v.isPresent()) {
            if (d < 2) {
                throw root.error("plan", "a plan view needs a 2D or 3D family ("
                    + family.name() + " is 1D)");
            }
            final double at = steady ? steadyTime(v, "time")[0] : v.number("time");
            if (!(at > 0)) {
                throw v.error("time", ParamSpec.format(at) + ": must be > 0");
            }
            final Grid x = v.grid("x");
            final Grid y = v.grid("y");
            if ((long) x.points() * y.points() > MAX_CELLS) {
                throw root.error("plan", x.points() + " x " + y.points()
                    + " cells: at most " + MAX_CELLS);
            }
            this.plan = new Plan(at, x, y, v.coordinate("z", d >= 3));
        } else {
            this.plan = null;
        }
        v.finish();

        final Table s = root.table("summary", false).expect("level");
        this.level = s.isPresent() ? s.optionalNumber("level") : null;
        if (level != null && !Double.isFinite(level)) {
            throw s.error("level", "must be finite");
        }
        s.finish();
        if (profiles == null && breakthrough == null && plan == null) {
            throw new UserError(root.file + ": nothing to report: give [profiles], "
                + "[breakthrough] or [plan]");
        }
        root.finish();
    }

    /**
     * The time of a steady state's profile or plan view: none may be given; +∞ stands for it
     * (the steady field does not read t).
     */
    private static double[] steadyTime(Table t, String key) {
        if (t.get(key) != null) {
            throw t.error(key, "a steady state (steady = true) has no time: leave " + key
                + " out");
        }
        return new double[] {Double.POSITIVE_INFINITY};
    }

    private void requireDomain(Table t, String key, double x) {
        if (!(x >= field.minX())) {
            throw t.error(key, ParamSpec.format(x) + ": outside the domain of " + family.name()
                + " (" + family.domain() + ")");
        }
    }

    /**
     * Reads and validates a scenario file.
     *
     * @param file the file
     * @return the scenario
     * @throws UserError naming the file and what is wrong with it
     */
    static Scenario read(Path file) {
        final String text;
        try {
            text = Files.readString(file);
        } catch (IOException e) {
            throw new UserError("cannot read " + file + ": " + Main.reason(e), e);
        }
        final JsonNode node;
        try {
            node = new TomlMapper().readTree(text);
        } catch (JacksonException e) {
            final JsonLocation where = e.getLocation();
            final String line = where == null || where.getLineNr() < 1 ? ""
                : " line " + where.getLineNr() + ":";
            throw new UserError(file + ":" + line + " not valid TOML: "
                + Main.oneLine(e.getOriginalMessage()), e);
        }
        String name = file.getFileName().toString();
        if (name.endsWith(".toml")) {
            name = name.substring(0, name.length() - 5);
        }
        return new Scenario(new Table(file.toString(), "", node), name);
    }

    /** A TOML table being read: remembers which keys were used, to reject unknown ones. */
    private static final class Table {
        final String file;
        final String path;
        final JsonNode node;
        final Set<String> used = new HashSet<>();

        Table(String file, String path, JsonNode node) {
            this.file = file;
            this.path = path;
            this.node = node;
        }

        boolean isPresent() {
            return node != null;
        }

        UserError error(String key, String what) {
            return new UserError(file + ": " + where(key) + ": " + what);
        }

        String where(String key) {
            return path.isEmpty() ? key : path + "." + key;
        }

        List<String> keys() {
            final List<String> keys = new ArrayList<>();
            if (node != null) {
                node.fieldNames().forEachRemaining(keys::add);
            }
            return keys;
        }

        JsonNode get(String key) {
            used.add(key);
            return node == null ? null : node.get(key);
        }

        /** Rejects any key not in the list, before the table's values are read. */
        Table expect(String... known) {
            final List<String> allowed = List.of(known);
            for (String key : keys()) {
                if (!allowed.contains(key)) {
                    throw error(key, "unknown key (known here: " + String.join(", ", known)
                        + ")");
                }
            }
            return this;
        }

        void finish() {
            for (String key : keys()) {
                if (!used.contains(key)) {
                    throw error(key, "unknown key");
                }
            }
        }

        Table table(String key, boolean required) {
            final JsonNode n = get(key);
            if (n == null && required) {
                throw new UserError(file + ": missing table [" + where(key) + "]");
            }
            if (n != null && !n.isObject()) {
                throw error(key, "must be a table");
            }
            return new Table(file, where(key), n);
        }

        List<Table> tables(String key) {
            final JsonNode n = get(key);
            if (n == null || !n.isArray() || n.isEmpty()) {
                throw error(key, "needs at least one point, e.g. [[" + where(key)
                    + "]] with x = ...");
            }
            final List<Table> list = new ArrayList<>();
            for (int i = 0; i < n.size(); i++) {
                if (!n.get(i).isObject()) {
                    throw error(key, "must be an array of tables");
                }
                list.add(new Table(file, where(key) + "[" + (i + 1) + "]", n.get(i)));
            }
            return list;
        }

        String string(String key, String fallback) {
            final JsonNode n = get(key);
            if (n == null) {
                return fallback;
            }
            if (!n.isTextual() || n.asText().isBlank()) {
                throw error(key, "must be a non-empty string");
            }
            return n.asText();
        }

        Object scalar(String key) {
            final JsonNode n = get(key);
            if (n.isNumber()) {
                return n.doubleValue();
            }
            if (n.isTextual() || n.isBoolean()) {
                return n.asText();
            }
            throw error(key, "must be a number or a string");
        }

        double number(String key) {
            final Double v = optionalNumber(key);
            if (v == null) {
                throw error(key, "missing");
            }
            return v;
        }

        Double optionalNumber(String key) {
            final JsonNode n = get(key);
            if (n == null) {
                return null;
            }
            if (!n.isNumber()) {
                throw error(key, "must be a number");
            }
            final double v = n.doubleValue();
            if (!Double.isFinite(v)) {
                throw error(key, ParamSpec.format(v) + ": must be finite");
            }
            return v;
        }

        /** A coordinate the family has (required) or has not (rejected). */
        double coordinate(String key, boolean has) {
            if (!has) {
                if (node != null && node.has(key)) {
                    throw error(key, "the family has no " + key + " coordinate");
                }
                return 0.0;
            }
            return number(key);
        }

        double[] numbers(String key) {
            final JsonNode n = get(key);
            if (n == null || !n.isArray() || n.isEmpty()) {
                throw error(key, "must be a non-empty array of numbers");
            }
            final double[] values = new double[n.size()];
            for (int i = 0; i < values.length; i++) {
                final JsonNode e = n.get(i);
                if (!e.isNumber() || !Double.isFinite(e.doubleValue())) {
                    throw error(key, "element " + (i + 1) + " must be a finite number");
                }
                values[i] = e.doubleValue();
            }
            return values;
        }

        Grid grid(String key) {
            final Table g = table(key, true).expect("from", "to", "points");
            final double from = g.number("from");
            final double to = g.number("to");
            final JsonNode pn = g.get("points");
            if (pn == null || !pn.isIntegralNumber()) {
                throw g.error("points", "must be a whole number");
            }
            g.finish();
            if (!(from < to)) {
                throw error(key, String.format(Locale.ROOT, "from = %s, to = %s: needs from < to",
                    ParamSpec.format(from), ParamSpec.format(to)));
            }
            final long points = pn.longValue();
            if (points < 2 || points > MAX_POINTS) {
                throw g.error("points", points + ": must be between 2 and " + MAX_POINTS);
            }
            return new Grid(from, to, (int) points);
        }
    }
}
