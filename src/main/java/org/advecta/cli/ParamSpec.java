package org.advecta.cli;

import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

/**
 * One parameter of a solution family: its short key, its meaning (with dimensions in terms of
 * length L, time T and concentration C, whatever units the user works in), its default and
 * its valid range. Immutable.
 *
 * <p>A parameter is either a number (finite, optionally bounded below) or a choice among
 * words. A number without a default is required, unless it is marked as used only with a
 * choice of another parameter (the family's factory then checks it).
 */
final class ParamSpec {

    /** A decimal number as written in a CSV cell, on the command line or in TOML text. */
    private static final Pattern DECIMAL =
        Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");

    private final String key;
    private final String meaning;
    private final List<String> choices;
    private final Double defaultNumber;
    private final String defaultChoice;
    private final double lower;
    private final boolean lowerOpen;
    private final boolean optional;

    private ParamSpec(String key, String meaning, List<String> choices, Double defaultNumber,
                      String defaultChoice, double lower, boolean lowerOpen, boolean optional) {
        this.key = key;
        this.meaning = meaning;
        this.choices = choices;
        this.defaultNumber = defaultNumber;
        this.defaultChoice = defaultChoice;
        this.lower = lower;
        this.lowerOpen = lowerOpen;
        this.optional = optional;
    }

    /**
     * A required number of any finite value.
     *
     * @param key the short key
     * @param meaning what it is, with its dimensions
     * @return the spec
     */
    static ParamSpec number(String key, String meaning) {
        return new ParamSpec(key, meaning, List.of(), null, null,
            Double.NEGATIVE_INFINITY, false, false);
    }

    /**
     * A choice among words, with a default.
     *
     * @param key the short key
     * @param meaning what it selects
     * @param defaultChoice the default, one of the choices
     * @param choices the valid words
     * @return the spec
     */
    static ParamSpec choice(String key, String meaning, String defaultChoice, String... choices) {
        return new ParamSpec(key, meaning, List.of(choices), null, defaultChoice,
            Double.NEGATIVE_INFINITY, false, false);
    }

    /**
     * Returns a copy with a default value.
     *
     * @param value the default
     * @return the new spec
     */
    ParamSpec byDefault(double value) {
        return new ParamSpec(key, meaning, choices, value, defaultChoice, lower, lowerOpen,
            optional);
    }

    /**
     * Returns a copy that needs values strictly above a bound.
     *
     * @param bound the bound
     * @return the new spec
     */
    ParamSpec above(double bound) {
        return new ParamSpec(key, meaning, choices, defaultNumber, defaultChoice, bound, true,
            optional);
    }

    /**
     * Returns a copy that needs values at or above a bound.
     *
     * @param bound the bound
     * @return the new spec
     */
    ParamSpec atLeast(double bound) {
        return new ParamSpec(key, meaning, choices, defaultNumber, defaultChoice, bound, false,
            optional);
    }

    /**
     * Returns a copy that may be left out without having a default (used only with some
     * choice of another parameter).
     *
     * @return the new spec
     */
    ParamSpec optional() {
        return new ParamSpec(key, meaning, choices, defaultNumber, defaultChoice, lower,
            lowerOpen, true);
    }

    /**
     * Returns the key.
     *
     * @return the short key, e.g. {@code D}
     */
    String key() {
        return key;
    }

    /**
     * Returns the meaning.
     *
     * @return what the parameter is
     */
    String meaning() {
        return meaning;
    }

    /**
     * Returns whether this is a choice among words.
     *
     * @return true for a choice
     */
    boolean isChoice() {
        return !choices.isEmpty();
    }

    /**
     * Returns whether the parameter must be given.
     *
     * @return true when there is no default and it is not optional
     */
    boolean isRequired() {
        return !optional && defaultNumber == null && defaultChoice == null;
    }

    /**
     * Returns the default as text for listings.
     *
     * @return the default, or "required", or "-" for an optional parameter
     */
    String defaultText() {
        if (defaultChoice != null) {
            return defaultChoice;
        }
        if (defaultNumber != null) {
            return format(defaultNumber);
        }
        return optional ? "-" : "required";
    }

    /**
     * Returns the default number.
     *
     * @return the default, or null
     */
    Double defaultNumber() {
        return defaultNumber;
    }

    /**
     * Returns the default choice.
     *
     * @return the default, or null
     */
    String defaultChoice() {
        return defaultChoice;
    }

    /**
     * Returns the valid range as text for listings and messages.
     *
     * @return e.g. "finite, > 0", or "left | right"
     */
    String rangeText() {
        if (isChoice()) {
            return String.join(" | ", choices);
        }
        if (lower == Double.NEGATIVE_INFINITY) {
            return "finite";
        }
        return "finite, " + (lowerOpen ? "> " : ">= ") + format(lower);
    }

    /**
     * Parses and checks a number written as text.
     *
     * @param text the text
     * @return the value
     * @throws UserError naming the key if the text is missing, not a number or out of range
     */
    double parse(String text) {
        if (text == null || text.isBlank()) {
            throw new UserError("parameter " + key + ": missing value");
        }
        final String s = text.strip();
        if (!DECIMAL.matcher(s).matches()) {
            throw new UserError("parameter " + key + " = '" + s + "': not a number");
        }
        return check(Double.parseDouble(s));
    }

    /**
     * Checks a number against the range.
     *
     * @param value the value
     * @return the value
     * @throws UserError naming the key and the value if it is out of range
     */
    double check(double value) {
        final boolean inRange = lowerOpen ? value > lower : value >= lower;
        if (inRange && Double.isFinite(value)) {
            return value;
        }
        throw new UserError("parameter " + key + " = " + format(value) + ": must be "
            + rangeText());
    }

    /**
     * Checks a word against the choices.
     *
     * @param text the word
     * @return the word
     * @throws UserError naming the key if it is not one of the choices
     */
    String checkChoice(String text) {
        final String s = text == null ? "" : text.strip();
        if (s.isEmpty()) {
            throw new UserError("parameter " + key + ": missing value");
        }
        if (choices.contains(s)) {
            return s;
        }
        throw new UserError("parameter " + key + " = '" + s + "': must be one of "
            + String.join(", ", choices));
    }

    /**
     * Tells whether a text is a plain decimal number (what the command line accepts).
     *
     * @param text the text, already stripped
     * @return true if it is
     */
    static boolean isDecimal(String text) {
        return DECIMAL.matcher(text).matches();
    }

    /**
     * Formats a number for listings and messages: a text that reads back to the
     * same double, without a trailing ".0".
     *
     * @param value the value
     * @return the text
     */
    static String format(double value) {
        final String s = Double.toString(value);
        return s.endsWith(".0") ? s.substring(0, s.length() - 2) : s;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s (%s; default %s; %s)", key, meaning,
            defaultText(), rangeText());
    }
}
