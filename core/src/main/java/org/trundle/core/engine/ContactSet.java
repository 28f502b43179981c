package org.trundle.core.engine;

import org.trundle.core.Phase;

/**
 * The contacts of a run: one {@link ContactSlot} per patch. The global {@link Phase} is a summary
 * of the slots: flight when no slot touches, sliding when a touching slot slides, rolling
 * otherwise; rest is the end state of a touching ball.
 *
 * <p>Today a run has one patch and so one slot; several simultaneous contacts (issue 12) add
 * slots here and their modes to the summary.
 */
final class ContactSet {
    private final ContactSlot[] slots;
    private boolean rest;
    /** The summary, recomputed whenever a mode changes (read on the hot path). */
    private Phase summary = Phase.FLIGHT;

    ContactSet(ContactSlot... slots) {
        this.slots = slots.clone();
    }

    /** @return the slot of the (single) patch */
    ContactSlot primary() {
        return slots[0];
    }

    /** @return the number of slots */
    int size() {
        return slots.length;
    }

    /**
     * @param i index
     * @return slot i
     */
    ContactSlot slot(int i) {
        return slots[i];
    }

    /** @return the global phase summarising the slots */
    Phase phase() {
        return summary;
    }

    private Phase summarise() {
        if (rest) {
            return Phase.REST;
        }
        Phase p = Phase.FLIGHT;
        for (ContactSlot s : slots) {
            if (s.mode == Mode.SLIDING) {
                return Phase.SLIDING;
            }
            if (s.mode == Mode.ROLLING) {
                p = Phase.ROLLING;
            }
        }
        return p;
    }

    /**
     * Sets the primary slot's mode from a global phase (the single-contact engine).
     *
     * @param p the phase
     */
    void setPhase(Phase p) {
        rest = p == Phase.REST;
        primary().mode = p == Phase.SLIDING ? Mode.SLIDING : p == Phase.FLIGHT ? Mode.APART : Mode.ROLLING;
        summary = summarise();
    }
}
