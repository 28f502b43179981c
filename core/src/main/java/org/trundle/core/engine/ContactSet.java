package org.trundle.core.engine;

import org.trundle.core.Phase;

/**
 * The contacts of a run: one {@link ContactSlot} per patch. The global {@link Phase} is a summary
 * of the slots: flight when no slot touches, sliding when a touching slot slides, rolling
 * otherwise; rest is the end state of a touching ball.
 *
 * <p>A scene has one slot per patch; the ball touches one at a time (the active slot), and a
 * hand-over or an impact activates another. Several simultaneous contacts (issue 12) let more than
 * one slot touch at once: their modes already enter the summary.
 */
final class ContactSet {
    private final ContactSlot[] slots;
    /** The slot in touch, or the last one touched (the right-hand side evaluates it). */
    private ContactSlot active;
    private boolean rest;
    /** The summary, recomputed whenever a mode changes (read on the hot path). */
    private Phase summary = Phase.FLIGHT;

    ContactSet(ContactSlot... slots) {
        this.slots = slots.clone();
        this.active = slots[0];
    }

    /** @return the active slot: the one in touch, or the last one touched */
    ContactSlot active() {
        return active;
    }

    /**
     * Makes another slot the active one, carrying the mode over (a hand-over, or the patch an
     * impact or a start touches).
     *
     * @param s the slot
     */
    void activate(ContactSlot s) {
        if (s != active) {
            s.mode = active.mode;
            active.mode = Mode.APART;
            // a pivoting hold belongs to the patch it was taken on
            active.pivotHeld = false;
            active = s;
            summary = summarise();
        }
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
     * Sets the active slot's mode from a global phase (the single-contact engine).
     *
     * @param p the phase
     */
    void setPhase(Phase p) {
        rest = p == Phase.REST;
        active.mode = p == Phase.SLIDING ? Mode.SLIDING : p == Phase.FLIGHT ? Mode.APART : Mode.ROLLING;
        if (p != Phase.ROLLING) {
            // the pivoting stick is a sub-mode of rolling
            active.pivotHeld = false;
        }
        summary = summarise();
    }
}
