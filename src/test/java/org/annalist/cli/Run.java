package org.annalist.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/** One command line run in-process, with what it printed. */
record Run(int exitCode, String out, String err) {

    static Run of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(code, out.toString(), err.toString());
    }
}
