package org.scalewright.io;

import java.io.IOException;
import java.nio.file.Path;

/**
 * A file or folder the program was asked to write is not one it may replace (a symbolic link, a
 * named pipe, a device, a read-only file, a folder holding other files …). Nothing was written. The
 * message says why, in words that follow "cannot write FILE: ".
 */
public final class OutputRefused extends IOException {
    private static final long serialVersionUID = 1L;
    private final transient Path target;

    public OutputRefused(Path target, String why) {
        super(why);
        this.target = target;
    }

    /** @return the file or folder that was not written */
    public Path target() {
        return target;
    }
}
