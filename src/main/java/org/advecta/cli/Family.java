package org.advecta.cli;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.function.Function;

/**
 * A solution family as the command line knows it: a short name, a one-line summary, the
 * domain, the number of space dimensions, the parameter specs and a factory from validated
 * parameters to a {@link Field}. Immutable. Registering a new family is one entry in
 * {@link Families}.
 */
final class Family {

    private final String name;
    private final String summary;
    private final String domain;
    private final int dimensions;
    private final List<ParamSpec> params;
    private final Function<Params, Field> factory;

    /**
     * Creates a descriptor.
     *
     * @param name short, lower-case, hyphenated name
     * @param summary one line: what the family solves
     * @param domain where it is defined, in words
     * @param dimensions 1, 2 or 3
     * @param params the parameter specs, transport parameters first
     * @param factory builds the field from validated parameters; may throw
     *     {@link IllegalArgumentException} (the library's checks) or {@link UserError}
     */
    Family(String name, String summary, String domain, int dimensions, List<ParamSpec> params,
           Function<Params, Field> factory) {
        this.name = name;
        this.summary = summary;
        this.domain = domain;
        this.dimensions = dimensions;
        this.params = Collections.unmodifiableList(new ArrayList<>(params));
        this.factory = factory;
    }

    /**
     * Returns the name.
     *
     * @return e.g. {@code slug}
     */
    String name() {
        return name;
    }

    /**
     * Returns the summary.
     *
     * @return one line
     */
    String summary() {
        return summary;
    }

    /**
     * Returns the domain in words.
     *
     * @return e.g. "line", "half-line x >= 0", "plane"
     */
    String domain() {
        return domain;
    }

    /**
     * Returns the number of space dimensions.
     *
     * @return 1, 2 or 3
     */
    int dimensions() {
        return dimensions;
    }

    /**
     * Returns the coordinate names a point of this family has, time last.
     *
     * @return e.g. [x, t] or [x, y, t]
     */
    List<String> coordinates() {
        final List<String> names = new ArrayList<>(List.of("x", "y", "z").subList(0, dimensions));
        names.add("t");
        return List.copyOf(names);
    }

    /**
     * Returns the parameter specs.
     *
     * @return the specs, in listing order
     */
    List<ParamSpec> params() {
        return params;
    }

    /**
     * Returns the spec of a key.
     *
     * @param key the key
     * @return the spec
     * @throws UserError if the family has no such parameter
     */
    ParamSpec spec(String key) {
        for (ParamSpec p : params) {
            if (p.key().equals(key)) {
                return p;
            }
        }
        throw new UserError("family " + name + " has no parameter '" + key + "' (its keys: "
            + String.join(", ", params.stream().map(ParamSpec::key).toArray(String[]::new))
            + ")");
    }

    /**
     * Builds the field.
     *
     * @param params validated parameters of this family
     * @return the field
     * @throws UserError if the library rejects a combination of parameters
     */
    Field create(Params params) {
        try {
            return factory.apply(params);
        } catch (IllegalArgumentException e) {
            throw new UserError("family " + name + ": " + e.getMessage(), e);
        }
    }
}
