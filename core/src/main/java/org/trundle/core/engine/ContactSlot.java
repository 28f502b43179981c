package org.trundle.core.engine;

import org.trundle.core.ContactContext;
import org.trundle.core.ContactGeometry;
import org.trundle.core.ContactLaw;
import org.trundle.core.Surface;

/**
 * One entry of the {@link ContactSet}: a patch the ball may touch, its contact law, its mode and
 * its own workspaces (geometry, law context). Each slot owns its workspaces, so a second contact
 * (issue 12) is a second slot, not a second set of engine fields.
 */
final class ContactSlot {
    /** The patch's surface. */
    final Surface surface;
    /** The patch's contact law. */
    final ContactLaw law;
    /** Whether the law adds couples ({@link ContactLaw#addsCouples()}), asked once. */
    final boolean couples;
    /**
     * Whether the law's couple about the normal is set-valued at zero relative normal spin
     * ({@link ContactLaw#hasPivotStick()}) and the law adds couples; asked once. Without it the
     * pivoting stick costs nothing.
     */
    final boolean pivotStick;
    /** Whether the relative normal spin is held at zero by an exact pivoting stick (rolling only). */
    boolean pivotHeld;
    /** Time (s) of the last pivoting release, so that the hold is not taken again at the same instant. */
    double pivotReleasedAt = Double.NaN;
    /** Geometry workspace of this patch. */
    final ContactGeometry geo = new ContactGeometry();
    /** The law's view of this contact. */
    final ContactContext ctx = new ContactContext();
    /** Rolling, sliding or apart. */
    Mode mode = Mode.APART;

    ContactSlot(Surface surface, ContactLaw law) {
        this.surface = surface;
        this.law = law;
        this.couples = law.addsCouples();
        this.pivotStick = couples && law.hasPivotStick();
        this.geo.scratch = surface.newScratch();
    }
}
