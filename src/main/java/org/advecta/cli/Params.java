package org.advecta.cli;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import org.advecta.transport.TransportParameters;

/**
 * A family's parameters after validation: every key known, every number finite and in range,
 * every default filled in. Immutable.
 */
final class Params {

    private final Family family;
    private final Map<String, Double> numbers;
    private final Map<String, String> words;

    private Params(Family family, Map<String, Double> numbers, Map<String, String> words) {
        this.family = family;
        this.numbers = Collections.unmodifiableMap(numbers);
        this.words = Collections.unmodifiableMap(words);
    }

    /**
     * Validates raw values against a family's specs. A raw value is a {@link String} (from
     * the command line) or a {@link Double} or {@link String} (from a scenario file).
     *
     * @param family the family
     * @param raw key to value, in the order given
     * @return the validated parameters
     * @throws UserError on an unknown key, a missing or malformed value, a value out of
     *     range or a missing required parameter
     */
    static Params of(Family family, Map<String, Object> raw) {
        return of(family, raw, Set.of());
    }

    /**
     * Validates raw values against a family's specs, as {@link #of(Family, Map)}, except that
     * the given keys may be missing even where the family requires them (a fit's free
     * parameters: {@link #has(String)} then tells whether a starting value was given).
     *
     * @param family the family
     * @param raw key to value, in the order given
     * @param mayBeMissing keys that need no value
     * @return the validated parameters
     * @throws UserError on an unknown key, a missing or malformed value, a value out of
     *     range or a missing required parameter not in mayBeMissing
     */
    static Params of(Family family, Map<String, Object> raw, Set<String> mayBeMissing) {
        final Map<String, Double> numbers = new LinkedHashMap<>();
        final Map<String, String> words = new LinkedHashMap<>();
        for (Map.Entry<String, Object> e : raw.entrySet()) {
            final ParamSpec spec = family.spec(e.getKey());
            final Object value = e.getValue();
            if (spec.isChoice()) {
                if (!(value instanceof String)) {
                    throw new UserError("parameter " + spec.key() + ": must be one of "
                        + spec.rangeText().replace(" | ", ", "));
                }
                words.put(spec.key(), spec.checkChoice((String) value));
            } else if (value instanceof Double) {
                numbers.put(spec.key(), spec.check((Double) value));
            } else if (value instanceof String) {
                numbers.put(spec.key(), spec.parse((String) value));
            } else {
                throw new UserError("parameter " + spec.key() + ": must be a number");
            }
        }
        for (ParamSpec spec : family.params()) {
            if (numbers.containsKey(spec.key()) || words.containsKey(spec.key())) {
                continue;
            }
            if (spec.isRequired() && !mayBeMissing.contains(spec.key())) {
                throw new UserError("family " + family.name() + " needs parameter "
                    + spec.key() + " (" + spec.meaning() + ")");
            }
            if (spec.defaultNumber() != null) {
                numbers.put(spec.key(), spec.defaultNumber());
            } else if (spec.defaultChoice() != null) {
                words.put(spec.key(), spec.defaultChoice());
            }
        }
        return new Params(family, numbers, words);
    }

    /**
     * Returns the family.
     *
     * @return the family these parameters belong to
     */
    Family family() {
        return family;
    }

    /**
     * Returns a number.
     *
     * @param key the key
     * @return its value
     * @throws UserError if the (optional) parameter was not given
     */
    double get(String key) {
        final Double v = numbers.get(key);
        if (v == null) {
            throw new UserError("family " + family.name() + " needs parameter " + key
                + " here (" + family.spec(key).meaning() + ")");
        }
        return v;
    }

    /**
     * Tells whether a number was given or defaulted.
     *
     * @param key the key
     * @return true if {@link #get(String)} has a value
     */
    boolean has(String key) {
        return numbers.containsKey(key);
    }

    /**
     * Returns a choice.
     *
     * @param key the key
     * @return the word
     */
    String word(String key) {
        return words.get(key);
    }

    /**
     * Returns the transport parameters v, D, R, μ (and D_T, D_V where the family has them).
     *
     * @return the parameters
     */
    TransportParameters transport() {
        TransportParameters p = TransportParameters.of(get("v"), get("D"))
            .withRetardation(get("R"))
            .withDecay(get("mu"));
        if (has("DT")) {
            p = p.withDispersion(get("D"), get("DT"), has("DV") ? get("DV") : get("DT"));
        }
        return p;
    }

    /**
     * Returns every value, numbers and words, in the family's order, as "key = value".
     *
     * @return the description
     */
    String describe() {
        final StringBuilder b = new StringBuilder();
        for (ParamSpec spec : family.params()) {
            final String text = spec.isChoice() ? words.get(spec.key())
                : numbers.containsKey(spec.key()) ? ParamSpec.format(numbers.get(spec.key()))
                : null;
            if (text != null) {
                b.append(b.length() == 0 ? "" : ", ").append(spec.key()).append(" = ")
                    .append(text);
            }
        }
        return b.toString();
    }
}
