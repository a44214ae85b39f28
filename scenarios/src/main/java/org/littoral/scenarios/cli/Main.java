package org.littoral.scenarios.cli;

import java.util.concurrent.Callable;
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

    /** See {@link org.littoral.scenarios.input.Failures#exitCode}. */
    public static int exitCode(Throwable ex) {
        return org.littoral.scenarios.input.Failures.exitCode(ex);
    }

    /** See {@link org.littoral.scenarios.input.Failures#message}. */
    public static String message(Throwable ex) {
        return org.littoral.scenarios.input.Failures.message(ex);
    }

    public static void main(String[] args) {
        System.setProperty("java.awt.headless", "true");
        System.exit(execute(args));
    }
}
