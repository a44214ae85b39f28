package org.littoral.scenarios.validate;

import java.util.List;

/**
 * A group of validation cases. Implementations live in the {@code validation} module and are found
 * with {@link java.util.ServiceLoader} (list them in
 * {@code META-INF/services/org.littoral.scenarios.validate.ValidationSuite}).
 */
public interface ValidationSuite {
    /** Heading for the report, e.g. "Thermodynamics". */
    String title();

    /** Order in the report (lower first). */
    default int order() {
        return 100;
    }

    /** Runs every case; a case that cannot be computed is returned as failed with the reason in its note. */
    List<ValidationCase> run();
}
