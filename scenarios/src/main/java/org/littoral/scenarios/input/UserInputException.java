package org.littoral.scenarios.input;

/**
 * A problem with what the user gave us (a file, a key, a value). The message is one line that names
 * the file, line or key, the offending value and the fix; the command line prints it without a stack
 * trace and exits with code 2.
 */
public class UserInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public UserInputException(String message) {
        super(message);
    }

    public UserInputException(String message, Throwable cause) {
        super(message, cause);
    }
}
