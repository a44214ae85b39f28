package org.littoral.scenarios.analysis.detect;

/** What a passage does to the wind in the detection layer, relative to the onshore sector. */
public enum PassageKind {
    /** Turns the wind from outside into the onshore sector: a breeze front (bay or sea breeze). */
    INTO_ONSHORE,
    /** Onshore before and after, with a larger onshore component after: e.g. the sea breeze after a bay breeze. */
    ONSHORE_STRENGTHENING,
    /** Turns the wind out of the onshore sector (breeze ending or retreating). */
    OUT_OF_ONSHORE,
    /** Any other change (shift outside the onshore sector, or an onshore weakening). */
    OTHER;

    public boolean onshore() {
        return this == INTO_ONSHORE || this == ONSHORE_STRENGTHENING;
    }
}
