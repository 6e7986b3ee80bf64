package org.scalewright.archive;

/**
 * The database failed in a way the user's input does not explain (a disk error, a lock held too
 * long): a program or system error. The transaction it happened in was rolled back.
 */
public final class ArchiveFailure extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public ArchiveFailure(String message, Throwable cause) {
        super(message, cause);
    }
}
