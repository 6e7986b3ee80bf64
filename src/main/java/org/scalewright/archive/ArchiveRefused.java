package org.scalewright.archive;

import org.scalewright.model.InvalidInput;

/**
 * The archive refuses a file or a request, with a reason a person can act on: a file that is not
 * an archive, one written by a newer version, a damaged one, an unknown instrument, a key the
 * version's sheet has no note for. Nothing has been written when it is thrown.
 */
public final class ArchiveRefused extends InvalidInput {
    private static final long serialVersionUID = 1L;

    public ArchiveRefused(String message) {
        super(message);
    }
}
