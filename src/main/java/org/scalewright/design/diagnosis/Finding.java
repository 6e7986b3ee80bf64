package org.scalewright.design.diagnosis;

import java.util.List;

/**
 * The finding of a diagnosis in plain words.
 *
 * @param cause       what sets the stress of the notes that run high
 * @param explanation the finding, one paragraph each: the range, the notes standing out, the cause
 * @param remedies    the changes that would bring the range under the caution band, each with its
 *                    computed effect (empty when the range is already under it), most fitting first
 * @param inspect     what the numbers cannot see and a technician should look at
 */
public record Finding(StressCause cause, List<String> explanation, List<Remedy> remedies, List<String> inspect) {
    public Finding {
        explanation = List.copyOf(explanation);
        remedies = List.copyOf(remedies);
        inspect = List.copyOf(inspect);
    }

    /** @return this finding with more paragraphs after its explanation (the recorded breaks) */
    public Finding withMore(List<String> paragraphs) {
        List<String> all = new java.util.ArrayList<>(explanation);
        all.addAll(paragraphs);
        return new Finding(cause, all, remedies, inspect);
    }

    /** @return the remedies that, applied, bring the range under the caution band */
    public List<Remedy> fixing() {
        return remedies.stream().filter(Remedy::fixes).toList();
    }
}
