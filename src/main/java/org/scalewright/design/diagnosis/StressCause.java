package org.scalewright.design.diagnosis;

/** What sets the stress of the notes that run high. */
public enum StressCause {
    /** the speaking length and the pitch: for plain wire the stress is the same for any diameter */
    LENGTH_AND_PITCH("length and pitch"),
    /** the wire: a weaker wire, or (wound strings) a heavy winding on a thin core */
    WIRE("the wire"),
    /** nothing runs high: no note stands out above its trend and none is in the caution band */
    NONE("nothing runs high");

    private final String words;

    StressCause(String words) {
        this.words = words;
    }

    /** @return the cause in plain words */
    public String words() {
        return words;
    }
}
