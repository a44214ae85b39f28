package org.littoral.scenarios.input;

/**
 * A failure that is not bad input but whose message already says, in one line, what happened and what to do (for
 * example a sweep's merge step that found members without a result): printed as it is, exit code 1.
 */
public class StatedFailure extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public StatedFailure(String message) {
        super(message);
    }
}
