package org.trundle.core.engine;

/** The state of one contact slot: rolling (no slip), sliding (slip), or apart (not touching). */
enum Mode {
    /** Touching without slip. */
    ROLLING,
    /** Touching with slip. */
    SLIDING,
    /** Not touching. */
    APART
}
