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
        this.geo.scratch = surface.newScratch();
    }
}
