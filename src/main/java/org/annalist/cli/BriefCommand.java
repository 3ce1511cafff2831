package org.annalist.cli;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
@Command(name = "brief")
final class BriefCommand implements Callable<Integer> { public Integer call() { return 0; } }
