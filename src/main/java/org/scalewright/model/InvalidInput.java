package org.scalewright.model;

/**
 * A value the user gave (an option, a typed entry, a cell) that the program does not accept.
 * The message is the one both front ends show: it names the quantity, what is accepted and
 * the value given ({@code pitch standard A4 must be 300 to 600 Hz, was 1200}). The command line
 * answers it with exit status 2 (bad input); an {@link IllegalArgumentException} from an engine
 * precondition is a program error instead (exit status 1).
 */
public class InvalidInput extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** @param message what was wrong, in one line the user can act on */
    public InvalidInput(String message) {
        super(message);
    }
}
