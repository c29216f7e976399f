package org.advecta.cli;

/**
 * A mistake in what the user gave (command line, data file, scenario): reported as one line
 * on standard error with a non-zero exit status, never with a stack trace.
 */
final class UserError extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /**
     * Creates the error.
     *
     * @param message one line naming what is wrong
     */
    UserError(String message) {
        super(message, null, false, false);
    }

    /**
     * Creates the error with the library's or a parser's exception as its cause.
     *
     * @param message one line naming what is wrong
     * @param cause what detected it
     */
    UserError(String message, Throwable cause) {
        super(message, cause, false, false);
    }
}
