package org.advecta.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * The command line: {@code advecta list}, {@code advecta eval}, {@code advecta run},
 * {@code advecta fit}, {@code advecta check}.
 *
 * <p>Exit status: 0 on success, 2 for a mistake in the command line or the input (one line on
 * standard error naming it, no stack trace), 3 for a fit that did not converge (its report is
 * still written), 1 for an internal failure.
 */
public final class Main {

    /** Exit status for a mistake in what the user gave. */
    static final int USER_ERROR = 2;
    /** Exit status of {@code fit} when the fit failed (its status and report are written). */
    static final int FIT_FAILED = 3;
    /** Exit status for a failure of the program itself. */
    static final int INTERNAL_ERROR = 1;

    /** The streams a command reads and writes. */
    static final class Io {
        private final InputStream in;
        private final PrintStream out;
        private final PrintStream err;

        /**
         * Bundles the streams.
         *
         * @param in standard input
         * @param out standard output
         * @param err standard error
         */
        Io(InputStream in, PrintStream out, PrintStream err) {
            this.in = in;
            this.out = out;
            this.err = err;
        }

        /**
         * Returns standard input.
         *
         * @return the stream
         */
        InputStream in() {
            return in;
        }

        /**
         * Returns standard output.
         *
         * @return the stream
         */
        PrintStream out() {
            return out;
        }

        /**
         * Returns standard error.
         *
         * @return the stream
         */
        PrintStream err() {
            return err;
        }
    }

    /** The top-level command: only dispatches to its subcommands. */
    @Command(name = "advecta", mixinStandardHelpOptions = true,
        version = "advecta 0.1.0-SNAPSHOT",
        description = "Exact solutions of R dc/dt = D d2c/dx2 - v dc/dx - mu c.",
        footer = {"", "Exit status: 0 success, 2 a mistake in the command or its input "
            + "(one line on standard error), 3 a fit that failed (fit only), 1 an internal "
            + "failure."})
    static final class Top implements Runnable {
        @Spec
        private CommandSpec spec;

        @Override
        public void run() {
            throw new CommandLine.ParameterException(spec.commandLine(),
                "missing subcommand (list, eval, run, fit or check)");
        }
    }

    private Main() {
    }

    /**
     * Runs the command line and exits with its status.
     *
     * @param args the arguments
     */
    public static void main(String[] args) {
        System.exit(execute(args, new Io(System.in, System.out, System.err)));
    }

    /**
     * Runs the command line in-process.
     *
     * @param args the arguments
     * @param io the streams
     * @return the exit status
     */
    static int execute(String[] args, Io io) {
        // The plots are drawn off-screen; this must precede the first use of AWT.
        System.setProperty("java.awt.headless", "true");
        final CommandLine cl = new CommandLine(new Top());
        cl.addSubcommand("list", new ListCommand(io));
        cl.addSubcommand("eval", new EvalCommand(io));
        cl.addSubcommand("run", new RunCommand(io));
        cl.addSubcommand("fit", new FitCommand(io));
        cl.addSubcommand("check", new CheckCommand(io));
        cl.setOut(new PrintWriter(io.out(), true, StandardCharsets.UTF_8));
        cl.setErr(new PrintWriter(io.err(), true, StandardCharsets.UTF_8));
        cl.setParameterExceptionHandler((ex, arguments) -> {
            final String command = ex.getCommandLine().getCommandName();
            final String prefix = "advecta".equals(command) ? "advecta" : "advecta " + command;
            io.err().println(prefix + ": " + oneLine(ex.getMessage()) + " (see '" + prefix
                + " --help')");
            return USER_ERROR;
        });
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            if (ex instanceof UserError) {
                io.err().println("advecta " + commandLine.getCommandName() + ": "
                    + oneLine(ex.getMessage()));
                return USER_ERROR;
            }
            if (ex instanceof CommandLine.ParameterException) {
                throw ex;
            }
            io.err().println("advecta " + commandLine.getCommandName() + ": internal error: "
                + ex);
            ex.printStackTrace(io.err());
            return INTERNAL_ERROR;
        });
        return cl.execute(args);
    }

    /**
     * Returns a message as one line.
     *
     * @param message the message, possibly null or with line breaks
     * @return one line
     */
    static String oneLine(String message) {
        if (message == null) {
            return "(no message)";
        }
        return message.strip().replaceAll("\\s*\\R\\s*", "; ");
    }

    /**
     * Describes why a file operation failed, in words.
     *
     * @param e the exception
     * @return e.g. "no such file"
     */
    static String reason(IOException e) {
        if (e instanceof NoSuchFileException) {
            return "no such file or directory";
        }
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof NotDirectoryException) {
            return "not a directory";
        }
        if (e instanceof FileAlreadyExistsException) {
            return "a file of that name is in the way";
        }
        return oneLine(e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage());
    }
}
