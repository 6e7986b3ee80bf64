package org.scalewright.cli;

/** A problem with the user's arguments or input, reported as one line each and exit status 2. */
public final class UserError extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public UserError(String message) {
        super(message);
    }
}
