package org.littoral.scenarios.validate;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.littoral.scenarios.output.AtomicFile;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code littoral validate}: runs every validation case and writes the report. */
@Command(name = "validate", description = "Check littoral against published results; print the table and write the report.")
public final class ValidateCommand implements Callable<Integer> {

    @Option(names = "--report", description = "Markdown report to write (default: ${DEFAULT-VALUE}).",
            defaultValue = "docs/validation.md")
    Path report;

    @Option(names = "--only", description = "Run only suites whose title contains this text (case-insensitive).")
    String only;

    @Override
    public Integer call() throws Exception {
        List<ValidationSuite> suites = ValidationReport.discover();
        if (only != null) {
            suites.removeIf(s -> !s.title().toLowerCase(java.util.Locale.ROOT).contains(only.toLowerCase(java.util.Locale.ROOT)));
        }
        if (suites.isEmpty()) {
            System.err.println("littoral: no validation suites found on the class path"
                    + (only != null ? " matching '" + only + "'" : "") + " (is the validation module in the jar?)");
            return 1;
        }
        ValidationReport r = ValidationReport.runAll(suites, System.err);
        System.out.print(r.table());
        AtomicFile.writeString(report, r.markdown());
        System.out.println("report written to " + report);
        return r.allPassed() ? 0 : 1;
    }
}
