package org.scalewright.cli;

import java.util.function.Supplier;
import org.scalewright.model.InvalidInput;

/** Shows an engine's refusal of an option value with the option's name in front; the check itself lives in the engine. */
final class OptionChecks {
    private OptionChecks() {
    }

    /**
     * @param option the option as typed, e.g. {@code --max-break}
     * @param check  reads or checks the value, throwing {@link InvalidInput} when it is refused
     * @return what the check returns
     * @throws InvalidInput {@code --max-break: maximum percent of breaking strength must be …}
     */
    static <T> T named(String option, Supplier<T> check) {
        try {
            return check.get();
        } catch (InvalidInput e) {
            throw new InvalidInput(option + ": " + e.getMessage());
        }
    }
}
