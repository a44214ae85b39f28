package org.littoral.scenarios.sweep;

/**
 * The merge step of a sweep found members without a result (a batch task that was cancelled, ran out of time or
 * memory, or has not run yet). Not bad input: the command exits 1 with this one-line message, after the lines that
 * say which shards are missing and why.
 */
public final class IncompleteRunException extends org.littoral.scenarios.input.StatedFailure {
    public IncompleteRunException(String message) {
        super(message);
    }
}
