package org.advecta.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

/** Runs the command line in-process and captures what it prints. */
final class Cli {

    /** What one run returned and printed. */
    static final class Result {
        final int status;
        final String out;
        final String err;

        Result(int status, String out, String err) {
            this.status = status;
            this.out = out;
            this.err = err;
        }

        /** Asserts success with nothing on standard error; returns standard output. */
        String ok() {
            assertEquals(0, status, () -> "status " + status + ", stderr: " + err);
            assertEquals("", err);
            return out;
        }

        /**
         * Asserts a user error: status 2, exactly one line on standard error that contains
         * every given fragment, no stack trace, nothing on standard output.
         */
        String userError(String... fragments) {
            assertEquals(Main.USER_ERROR, status, () -> "status " + status + ", stderr: " + err);
            assertTrue(err.endsWith("\n"), () -> "no line end: " + err);
            final String line = err.substring(0, err.length() - 1);
            assertFalse(line.contains("\n"), () -> "more than one line: " + err);
            assertFalse(line.contains("Exception") || line.contains("\tat "),
                () -> "a stack trace: " + err);
            assertTrue(line.startsWith("advecta"), line);
            for (String f : fragments) {
                assertTrue(line.contains(f), () -> "'" + f + "' missing from: " + line);
            }
            assertEquals("", out);
            return line;
        }
    }

    private Cli() {
    }

    /** Runs with empty standard input. */
    static Result run(String... args) {
        return runWithInput("", args);
    }

    /** Runs with the given text on standard input. */
    static Result runWithInput(String stdin, String... args) {
        final ByteArrayOutputStream out = new ByteArrayOutputStream();
        final ByteArrayOutputStream err = new ByteArrayOutputStream();
        final int status;
        try (PrintStream o = new PrintStream(out, true, StandardCharsets.UTF_8);
             PrintStream e = new PrintStream(err, true, StandardCharsets.UTF_8)) {
            status = Main.execute(args, new Main.Io(
                new ByteArrayInputStream(stdin.getBytes(StandardCharsets.UTF_8)), o, e));
        }
        return new Result(status, out.toString(StandardCharsets.UTF_8),
            err.toString(StandardCharsets.UTF_8));
    }
}
