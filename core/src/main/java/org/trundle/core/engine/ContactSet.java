package org.trundle.core.engine;

import org.trundle.core.Phase;

/**
 * The contacts of a run: one {@link ContactSlot} per patch. The global {@link Phase} is a summary
 * of the slots: flight when no slot touches, sliding when a touching slot slides, rolling
 * otherwise; rest is the end state of a touching ball.
 *
 * <p>The ball touches at most {@value ContactForceSolver#MAX_CONTACTS} patches at once. The first one
 * touched is the active slot (position 0; a hand-over or an impact from flight activates another); the
 * others touching at the same time follow it in the order they were touched (positions 1 and 2). With one
 * contact the engine keeps the closed form of design notes §3; with several ({@link #multi()}) the contact
 * forces come from {@link ContactForceSolver}.
 */
final class ContactSet {
    private final ContactSlot[] slots;
    /** The slot in touch, or the last one touched (the right-hand side evaluates it). */
    private ContactSlot active;
    /** Slots touching besides the active one, in the order touched. */
    private final ContactSlot[] extra = new ContactSlot[ContactForceSolver.MAX_CONTACTS - 1];
    private int extraCount;
    private boolean rest;
    /** The summary, recomputed whenever a mode changes (read on the hot path). */
    private Phase summary = Phase.FLIGHT;
    /**
     * Bumped whenever the touching slots or their modes change, so that a snapshot of a state taken before
     * a switch (same time and state, other contacts) is not reused after it ({@link Snapshots}).
     */
    private long generation;

    /** @return the generation of the contacts (changes with every change of the touching slots or modes) */
    long generation() {
        return generation;
    }

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
     * impact or a start touches). Only with one contact.
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
            generation++;
        }
    }

    /** @return whether the ball touches more than one patch now */
    boolean multi() {
        return extraCount > 0;
    }

    /**
     * Whether the ball rolls on exactly two patches that both stand still (a groove, two rails): the case
     * {@link RollingPair} solves in closed form, where the velocity is derived from the spin as with one
     * contact ({@code v = r ω × n} with the active slot's normal) and the segment integrates the compact
     * rolling layout.
     *
     * @return whether two still patches are touched, both rolling
     */
    boolean rollingPair() {
        return extraCount == 1 && summary == Phase.ROLLING && !active.moving && !extra[0].moving;
    }

    /** @return the number of patches touched now (0 in flight) */
    int count() {
        return active.mode == Mode.APART ? 0 : 1 + extraCount;
    }

    /**
     * @param k position, 0 for the active slot
     * @return the slot touched at position k
     */
    ContactSlot at(int k) {
        return k == 0 ? active : extra[k - 1];
    }

    /**
     * @param s a slot
     * @return its position among the touching slots, or −1 when it does not touch
     */
    int positionOf(ContactSlot s) {
        if (s.mode == Mode.APART) {
            return -1;
        }
        if (s == active) {
            return 0;
        }
        for (int k = 0; k < extraCount; k++) {
            if (extra[k] == s) {
                return k + 1;
            }
        }
        return -1;
    }

    /**
     * Adds a contact while the ball already touches (a second or third patch reached).
     *
     * @param s the slot, not touching
     * @param mode its mode (rolling or sliding)
     */
    void add(ContactSlot s, Mode mode) {
        if (extraCount == extra.length) {
            throw new IllegalStateException("at most " + ContactForceSolver.MAX_CONTACTS + " contacts at once");
        }
        extra[extraCount++] = s;
        s.mode = mode;
        // a pivoting hold is taken again for the new set of contacts (Transitions#pivotCheck)
        dropPivotHolds();
        summary = summarise();
        generation++;
    }

    /**
     * Ends one contact of several (a release, an exit); when it is the active one, the next touching
     * slot becomes active.
     *
     * @param s a touching slot
     */
    void remove(ContactSlot s) {
        if (s == active) {
            if (extraCount == 0) {
                setPhase(Phase.FLIGHT);
                return;
            }
            active = extra[0];
            System.arraycopy(extra, 1, extra, 0, extraCount - 1);
        } else {
            int k = positionOf(s) - 1;
            System.arraycopy(extra, k + 1, extra, k, extraCount - 1 - k);
        }
        extra[--extraCount] = null;
        s.mode = Mode.APART;
        s.pivotHeld = false;
        summary = summarise();
        generation++;
    }

    /**
     * A hand-over of one contact of several: {@code in} takes the place (and mode) of the touching slot
     * {@code out}, which no longer touches; when {@code out} was the active slot, {@code in} is.
     *
     * @param out a touching slot
     * @param in a slot that does not touch
     */
    void replace(ContactSlot out, ContactSlot in) {
        if (out == active) {
            active = in;
        } else {
            extra[positionOf(out) - 1] = in;
        }
        in.mode = out.mode;
        System.arraycopy(out.slideDir, 0, in.slideDir, 0, 3);
        out.mode = Mode.APART;
        dropPivotHolds();
        summary = summarise();
        generation++;
    }

    /**
     * Sets one touching slot's mode.
     *
     * @param s the slot
     * @param mode rolling or sliding
     */
    void setMode(ContactSlot s, Mode mode) {
        if (s.mode != mode) {
            // which contact may hold its spin about the normal depends on the modes (pivotSlot)
            dropPivotHolds();
        }
        s.mode = mode;
        summary = summarise();
        generation++;
    }

    /**
     * The contact whose spin about its normal is free and may be held by the exact pivoting stick
     * ({@link PivotRule}): with one contact, the active one while it rolls; with several, the only rolling
     * one while every other slides (two rolling contacts on still patches fix the spin: it is along the chord,
     * so {@code ω·n_i} is zero only at rest); in both cases only on a still patch whose law has the stick
     * ({@link ContactSlot#pivotStick}).
     *
     * @return that slot, or null
     */
    ContactSlot pivotSlot() {
        if (active.mode == Mode.APART || rest) {
            return null;
        }
        ContactSlot rolling = null;
        for (int k = 0; k <= extraCount; k++) {
            ContactSlot s = at(k);
            if (s.mode == Mode.ROLLING) {
                if (rolling != null) {
                    return null;
                }
                rolling = s;
            }
        }
        return rolling != null && rolling.pivotStick ? rolling : null;
    }

    /** Ends every pivoting hold (the contacts or their modes changed). */
    private void dropPivotHolds() {
        for (ContactSlot s : slots) {
            s.pivotHeld = false;
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
     * Sets the active slot's mode from a global phase (the single-contact engine); flight ends every
     * contact, rest keeps the modes; with several contacts a contact phase changes no mode (their modes are
     * set one by one, {@link #setMode}).
     *
     * @param p the phase
     */
    void setPhase(Phase p) {
        if (extraCount > 0 && p.inContact()) {
            // several contacts keep their own modes; the global phase is their summary
            rest = false;
            summary = summarise();
            generation++;
            return;
        }
        rest = p == Phase.REST;
        if (p == Phase.FLIGHT) {
            for (int k = 0; k < extraCount; k++) {
                extra[k].mode = Mode.APART;
                extra[k] = null;
            }
            extraCount = 0;
        }
        if (!rest || extraCount == 0) {
            active.mode = p == Phase.SLIDING ? Mode.SLIDING : p == Phase.FLIGHT ? Mode.APART : Mode.ROLLING;
        }
        if (p != Phase.ROLLING) {
            // the pivoting stick is a sub-mode of rolling
            active.pivotHeld = false;
        }
        summary = summarise();
        generation++;
    }
}
