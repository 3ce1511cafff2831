package org.annalist.cli;

import picocli.CommandLine.Option;

/** {@code --debug}: show the stack trace of an internal error. */
final class DebugOption {
    @Option(names = "--debug", description = "On an internal error, print the stack trace.")
    boolean debug;
}
