package org.annalist.cli;

import java.io.PrintWriter;
import org.annalist.brief.SelectionProblem;
import org.annalist.brief.SpecProblem;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.DataProblemException;
import org.annalist.narrative.TemplateEngine;
import picocli.CommandLine;

/**
 * The exit codes, and the one place that decides which a failure gets and what it prints: a
 * message, never a stack trace, unless {@code --debug} asks for it on an internal error.
 */
final class ExitCodes {

    /** Done. */
    static final int DONE = 0;
    /** An internal error: a short message; the stack trace with {@code --debug}. */
    static final int INTERNAL_ERROR = 1;
    /** Bad input or usage: the message names the file, line and column where it can. */
    static final int BAD_INPUT = 2;
    /** {@code batch}: some briefs failed, the others were made. */
    static final int SOME_FAILED = 3;

    private ExitCodes() {
    }

    /**
     * For picocli's parameter errors: an unknown option or command (with the name most likely meant,
     * see {@link Suggestions}), a value that is not one of the words, …
     */
    static int usage(CommandLine.ParameterException e, String[] args) {
        String message = e instanceof CommandLine.UnmatchedArgumentException unmatched && !unmatched.getUnmatched().isEmpty()
                ? Suggestions.unmatched(unmatched) : e.getMessage();
        e.getCommandLine().getErr().println("annalist: " + message);
        e.getCommandLine().getErr().println("Try '" + e.getCommandLine().getCommandSpec().qualifiedName() + " --help'.");
        return BAD_INPUT;
    }

    /** For what a command throws. */
    static int failure(Exception exception, CommandLine cli, CommandLine.ParseResult parsed) {
        PrintWriter err = cli.getErr();
        Throwable e = exception instanceof CommandLine.ExecutionException wrapped && wrapped.getCause() instanceof Error
                ? wrapped.getCause() : exception;
        if (e instanceof DataProblemException problems) {
            for (DataProblem problem : problems.problems()) {
                err.println(problem);
            }
            return BAD_INPUT;
        }
        if (e instanceof SpecProblem) {
            err.println(e.getMessage()); // already SPEC:LINE:COLUMN: message, as data problems are written
            return BAD_INPUT;
        }
        if (e instanceof UserInputException || e instanceof TemplateEngine.TemplateProblem
                || e instanceof SelectionProblem) {
            err.println("annalist: " + e.getMessage());
            return BAD_INPUT;
        }
        return escaped(e, err, debug(parsed));
    }

    /**
     * An internal error, whatever it is (an {@link Error} too): one line, exit 1; the stack trace
     * only with {@code --debug}.
     */
    static int escaped(Throwable e, PrintWriter err, boolean debug) {
        err.println("annalist: internal error: " + describe(e) + (debug ? "" : " (run with --debug for details)"));
        if (debug) {
            e.printStackTrace(err);
        }
        err.flush();
        return INTERNAL_ERROR;
    }

    /** What went wrong, on one line; an Error says what it means for the user. */
    static String describe(Throwable e) {
        String what = e instanceof OutOfMemoryError ? "out of memory (" + e + "); a larger heap may help (ANNALIST_JAVA_OPTS=-Xmx2g annalist …)"
                : e instanceof StackOverflowError ? "the computation nested too deeply (" + e + ")"
                : String.valueOf(e);
        return what.replaceAll("\\s*\\R\\s*", " ");
    }

    private static boolean debug(CommandLine.ParseResult parsed) {
        for (CommandLine.ParseResult p = parsed; p != null; p = p.subcommand()) {
            if (p.hasMatchedOption("--debug")) {
                return true;
            }
        }
        return false;
    }
}
