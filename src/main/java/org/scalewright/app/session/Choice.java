package org.scalewright.app.session;

/**
 * One entry of a choice list in the window: the words shown and the value chosen.
 *
 * @param label what the list shows
 * @param value what choosing it means
 * @param <T>   the kind of value
 */
public record Choice<T>(String label, T value) {
    public Choice {
        if (label == null || label.isBlank() || value == null) {
            throw new IllegalArgumentException("a choice needs words and a value, was '" + label + "' and " + value);
        }
    }

    @Override
    public String toString() {
        return label;
    }
}
