package org.scalewright.cli;

/** Exit statuses of the command line (DESIGN §5). */
public final class ExitStatus {
    /** success */
    public static final int OK = 0;
    /** an internal error */
    public static final int INTERNAL = 1;
    /** bad input or bad arguments */
    public static final int BAD_INPUT = 2;

    private ExitStatus() {
    }
}
