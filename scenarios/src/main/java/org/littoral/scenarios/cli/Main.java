package org.littoral.scenarios.cli;

import java.util.concurrent.Callable;
import org.littoral.scenarios.bench.BenchCommand;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.validate.ValidateCommand;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ScopeType;

/** The {@code littoral} command line. */
@Command(name = "littoral", mixinStandardHelpOptions = true, scope = ScopeType.INHERIT,
        version = org.littoral.scenarios.LittoralVersion.LABEL,
        description = "Idealised coastal-circulation simulator for scenario comparison.%n"
                + "Idealised model: not a forecast; never use its output for aviation, marine or public-safety decisions.",
        subcommands = {
            ValidateCommand.class,
            BenchCommand.class,
            org.littoral.scenarios.sweep.SweepCommand.class,
            org.littoral.scenarios.plan.PlanCommand.class,
            org.littoral.scenarios.timing.CheckTimingCommand.class,
            org.littoral.scenarios.sensitivity.InfluenceCommand.class,
            org.littoral.scenarios.observe.ObserveCommand.class,
            org.littoral.scenarios.run.RunCommand.class,
            org.littoral.scenarios.run.ScenariosCommand.class,
            org.littoral.scenarios.compare.CompareCommand.class,
            org.littoral.scenarios.demo.MakeDemoDataCommand.class,
            org.littoral.scenarios.demo.DemoCommand.class,
        })
public final class Main implements Callable<Integer> {

    @Option(names = "--debug", scope = ScopeType.INHERIT, description = "Print stack traces for errors.")
    boolean debug;

    @Override
    public Integer call() {
        new CommandLine(this).usage(System.out);
        return 0;
    }

    /** Exit codes: 0 success, 1 a check or run failed, 2 bad input. */
    public static int execute(String... args) {
        Main main = new Main();
        CommandLine cl = new CommandLine(main);
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            boolean dbg = parseResult.hasMatchedOption("--debug") || main.debug
                    || java.util.Arrays.asList(args).contains("--debug");
            if (exitCode(ex) == 2) {
                commandLine.getErr().println("littoral: error: " + message(ex));
                if (dbg) {
                    ex.printStackTrace(commandLine.getErr());
                }
                return 2;
            }
            commandLine.getErr().println("littoral: failed: " + message(ex));
            if (dbg) {
                ex.printStackTrace(commandLine.getErr());
            } else {
                commandLine.getErr().println("(run again with --debug for the stack trace)");
            }
            return 1;
        });
        try {
            return cl.execute(args);
        } catch (OutOfMemoryError e) {
            // the work estimates should prevent this; if it happens anyway, one line and what to do
            System.err.println("littoral: failed: out of memory (the Java heap limit is "
                    + Runtime.getRuntime().maxMemory() / 1048576 + " MB); make the run smaller (grid, output.step_min, "
                    + "flights) or give Java more memory: LITTORAL_JAVA_OPTS=-Xmx8g");
            return 1;
        }
    }

    /**
     * The exit code for an error a command raised: 2 for bad input (including an output folder that cannot be
     * written: no permission, a read-only or full disk), 1 for anything else.
     */
    public static int exitCode(Throwable ex) {
        if (ex instanceof UserInputException || ex instanceof IllegalArgumentException) {
            return 2;
        }
        return writeProblem(ex) != null ? 2 : 1;
    }

    /** The text printed after "littoral: error: " (exit 2) or "littoral: failed: " (exit 1). */
    public static String message(Throwable ex) {
        if (ex instanceof UserInputException || ex instanceof IllegalArgumentException) {
            return ex.getMessage();
        }
        String w = writeProblem(ex);
        if (w == null && ex instanceof org.littoral.scenarios.sweep.IncompleteRunException) {
            return ex.getMessage();
        }
        return w != null ? w : String.valueOf(ex);
    }

    /** One line for a file that could not be written because of the disk or permissions, or null. */
    static String writeProblem(Throwable ex) {
        for (Throwable c = ex; c != null; c = c.getCause()) {
            if (c instanceof java.nio.file.AccessDeniedException a) {
                return "cannot write " + a.getFile() + ": permission denied; give an --out folder you can write to";
            }
            if (c instanceof java.io.IOException io) {
                String m = String.valueOf(io.getMessage());
                String file = io instanceof java.nio.file.FileSystemException fs && fs.getFile() != null ? fs.getFile() : null;
                if (m.contains("No space left") || m.contains("Disk quota")) {
                    return "cannot write " + (file != null ? file : "the outputs") + ": the disk is full; free some space or "
                            + "give an --out folder on another disk";
                }
                if (m.contains("Read-only file system")) {
                    return "cannot write " + (file != null ? file : "the outputs") + ": the disk is read-only; give an --out "
                            + "folder you can write to";
                }
            }
        }
        return null;
    }

    public static void main(String[] args) {
        System.setProperty("java.awt.headless", "true");
        System.exit(execute(args));
    }
}
