package org.littoral.scenarios.input;

/**
 * A problem with what the user gave us (a file, a key, a value, an option). The message is one line that names
 * the file, line and column or key, the offending value (shortened) and the fix; the command line prints it
 * without a stack trace and exits with code 2. Build messages with {@link InputDocument} (YAML/JSON files),
 * {@link InputText} (reading any file) and {@link Shown} (values); see DEVELOPERS.md, Errors.
 *
 * <p>As a last safety net the constructor keeps any message to one line of at most {@link #MAX_LENGTH}
 * characters: line breaks become spaces and an over-long middle is cut, so that even a careless message cannot
 * flood a terminal or echo a whole file.
 */
public class UserInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** Longest message kept whole. */
    public static final int MAX_LENGTH = 1000;

    public UserInputException(String message) {
        super(oneLine(message));
    }

    public UserInputException(String message, Throwable cause) {
        super(oneLine(message), cause);
    }

    /** The message as one line of at most {@link #MAX_LENGTH} characters. */
    static String oneLine(String message) {
        if (message == null) {
            return null;
        }
        String s = message.replaceAll("\\s*[\\r\\n]+\\s*", " ").replace('\t', ' ');
        if (s.length() <= MAX_LENGTH) {
            return s;
        }
        int head = MAX_LENGTH * 2 / 3;
        int tail = MAX_LENGTH - head - 7;
        return s.substring(0, head) + " [...] " + s.substring(s.length() - tail);
    }
}
