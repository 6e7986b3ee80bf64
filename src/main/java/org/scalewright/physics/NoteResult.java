package org.scalewright.physics;

import java.util.List;

/**
 * The computed state of one note's strings at its working pitch, SI throughout.
 *
 * @param key               key number
 * @param noteName          note name, sharps ({@code C#4})
 * @param section           section label ("" when none)
 * @param frequency         working pitch, Hz
 * @param strings           strings per note
 * @param wound             true for a wound string
 * @param coreDiameter      plain wire or core diameter, m
 * @param massPerLength     μ for the fundamental, kg/m: a wound string's effective μ where bare
 *                          core lies inside the speaking length (DESIGN §3), else its μ
 * @param stiffness         K, N
 * @param tension           tension per string, N
 * @param noteTension       strings × tension, N
 * @param stress            core stress, Pa
 * @param breakingStrength  breaking strength of the core wire, Pa
 * @param breakPct          percent of breaking strength, %
 * @param inharmonicity     B
 * @param headroomCents     cents above the working pitch at which the core reaches its strength
 * @param breakingFrequency the pitch at which the core reaches its strength, Hz
 * @param impedance         √(T μ), kg/s
 * @param elongation        stretch from slack to pitch over the stretched length, m
 * @param band              stress band
 * @param flags             the flags raised on this note
 */
public record NoteResult(int key, String noteName, String section, double frequency, int strings, boolean wound,
                         double coreDiameter, double massPerLength, double stiffness, double tension,
                         double noteTension, double stress, double breakingStrength, double breakPct,
                         double inharmonicity, double headroomCents, double breakingFrequency, double impedance,
                         double elongation, StressBand band, List<Flag> flags) {

    public NoteResult {
        flags = List.copyOf(flags);
    }

    /** @return true when any flag is raised on this note */
    public boolean isFlagged() {
        return !flags.isEmpty();
    }
}
