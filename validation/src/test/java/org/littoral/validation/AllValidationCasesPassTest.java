package org.littoral.validation;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.littoral.scenarios.validate.ValidationCase;
import org.littoral.scenarios.validate.ValidationReport;
import org.littoral.scenarios.validate.ValidationSuite;

/** Every published-result check in `littoral validate` is also a test: the build fails when a case fails. */
class AllValidationCasesPassTest {

    @Test
    void suitesAreRegistered() {
        assertFalse(ValidationReport.discover().isEmpty(), "no ValidationSuite registered in META-INF/services");
    }

    @TestFactory
    Stream<DynamicTest> everyValidationCasePasses() {
        List<DynamicTest> tests = new ArrayList<>();
        for (ValidationSuite suite : ValidationReport.discover()) {
            List<ValidationCase> cases = suite.run();
            for (ValidationCase c : cases) {
                tests.add(DynamicTest.dynamicTest(suite.title() + ": " + c.id(), () -> assertTrue(c.passed(),
                        c.id() + ": " + c.quantity() + " expected " + c.expected() + " " + c.tolerance() + ", got "
                                + c.result() + " (" + c.source() + ") " + (c.note() == null ? "" : c.note()))));
            }
        }
        return tests.stream();
    }
}
