package org.littoral.scenarios;

/** The version that the command line prints and every written file records. */
public final class LittoralVersion {
    /** Program name and version, e.g. in netCDF "source" and "history" attributes and {@code --version}. */
    public static final String LABEL = "littoral 0.1.0";

    private LittoralVersion() {
    }
}
