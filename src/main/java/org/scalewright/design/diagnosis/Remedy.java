package org.scalewright.design.diagnosis;

/**
 * A change that would bring a diagnosed range under the caution band, with its effect computed
 * by applying it and recomputing every note of the range through the physics.
 */
public sealed interface Remedy permits LowerPitch, StrongerWire, ShorterLengths, ThinnerWire {

    /** @return what the change is, in plain words, with its figures */
    String describe();

    /** @return the highest percent of breaking strength in the range with the change applied, % */
    double maxPctAfter();

    /** @return true when, applied, the change brings every note of the range under the caution band */
    boolean fixes();
}
