package org.scalewright.design.wirecheck;

import org.scalewright.model.CoreWire;

/**
 * What a size conversion did to one note's wire.
 *
 * @param from   the present plain wire or core
 * @param to     the replacement (the same wire when nothing changed)
 * @param remark why it changed or did not, in plain words ("" when there is nothing to say)
 */
public record WireChange(CoreWire from, CoreWire to, String remark) {
    public WireChange {
        remark = remark == null ? "" : remark;
    }

    /** @return true when the replacement has another diameter */
    public boolean changed() {
        return Math.abs(from.diameter() - to.diameter()) > NeighbourPick.EXACT_TOLERANCE;
    }
}
