package org.littoral.scenarios.analysis.stats;

/**
 * Breeze type of a day from the ambient wind relative to the coast (Miller et al. 2003, Rev.
 * Geophys. 41(3), 1011; Steele et al. 2013, ACP 13, 443-461; Steele et al. 2015, QJRMS 141,
 * 1821-1835; docs/references.md section 3).
 */
public enum BreezeType {
    /** Offshore or weak ambient flow. */
    PURE,
    /** Shore-parallel flow with the land on the left looking downwind (Northern Hemisphere; right in the Southern). */
    CORKSCREW,
    /** Shore-parallel flow with the land on the right looking downwind (Northern Hemisphere; left in the Southern). */
    BACKDOOR,
    /** Ambient flow already onshore. */
    SYNOPTIC,
    /** No ambient wind available for the day. */
    UNDETERMINED
}
