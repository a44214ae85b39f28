package org.littoral.scenarios.run;

import java.io.PrintStream;
import java.util.concurrent.Callable;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code littoral scenarios}: the built-in scenarios and what each shows. */
@Command(name = "scenarios", description = "List the built-in scenarios, or print one (--show NAME) to start your own file from.")
public final class ScenariosCommand implements Callable<Integer> {

    @Option(names = "--show", paramLabel = "NAME", description = "Print the YAML of a built-in scenario.")
    String show;

    @Override
    public Integer call() {
        if (show != null) {
            System.out.print(BuiltinScenarios.text(show));
            return 0;
        }
        printList(System.out);
        return 0;
    }

    static void printList(PrintStream out) {
        for (String name : BuiltinScenarios.names()) {
            out.printf("%-22s %s%n", name, BuiltinScenarios.resolve(name).description());
        }
    }
}
