package org.littoral.scenarios.input;

/**
 * How any layer reports an error to a person: the exit code and the one line to print. Bad input (a
 * {@link UserInputException}, an {@link IllegalArgumentException} from the model, or an output folder that cannot be
 * written: no permission, a read-only or full disk) is exit 2; anything else exit 1. Used by the command line and by
 * whatever replays it (the input fuzzing).
 */
public final class Failures {
    private Failures() {
    }

    /** The exit code for an error a command raised: 2 for bad input, 1 for anything else. */
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
        if (w == null && ex instanceof StatedFailure) {
            return ex.getMessage();
        }
        return w != null ? w : String.valueOf(ex);
    }

    /** One line for a file that could not be written because of the disk or permissions, or null. */
    public static String writeProblem(Throwable ex) {
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
}
