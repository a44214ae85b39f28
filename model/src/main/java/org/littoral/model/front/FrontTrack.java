package org.littoral.model.front;

/**
 * The breeze's leading edge through time, and THE definitions derived from it (docs/fronts.md):
 * {@link #onsetAtCoast()}, {@link #arrivalAt(double)}, {@link #maxPenetration()}, {@link #impliedSpeed} and
 * {@link #peakBreeze()}. Every job (run summary, sweep, planner truth, timing envelope, compare) reads its times
 * from here, so they all mean the same thing.
 *
 * <p>The leading edge at an output time is the front (nonlinear model, when the {@link FrontCriteria} hold) or
 * the onshore reach (linear theory, which has no front). Arrival at x is the first time the edge is at or
 * beyond x, interpolated linearly in time from the previous output time when the edge existed then too, else
 * the midpoint of the two output times; its uncertainty is half the interval between the two times it is
 * interpolated between (normally half the output interval; up to {@link #MAX_GAP_H} / 2 across a short gap in
 * the track). A place the edge already
 * covers at the first time has no arrival (onshore from the start), so arrival times never decrease with
 * distance inland.
 */
public final class FrontTrack {
    /**
     * Longest stretch of output times without an identified edge across which the edge is still taken to have
     * moved steadily, h: a front that briefly fails a criterion (e.g. its contrast washed out by a convective
     * cell) is the same front when it reappears farther inland.
     */
    public static final double MAX_GAP_H = 1.0;

    private final NearSurfaceSection section;
    private final FrontCriteria criteria;
    private final double[] reachM;
    private final boolean[] reachAtLimit;
    private final double[] frontXM;
    private final double[] convergencePerS;
    private final double[] jumpMPerS;
    private final double[] contrastK;
    private final double searchFromM;
    private final double searchToM;

    FrontTrack(NearSurfaceSection section, FrontCriteria criteria, double[] reachM, boolean[] reachAtLimit, double[] frontXM,
               double[] convergencePerS, double[] jumpMPerS, double[] contrastK, double searchFromM, double searchToM) {
        this.section = section;
        this.criteria = criteria;
        this.reachM = reachM;
        this.reachAtLimit = reachAtLimit;
        this.frontXM = frontXM;
        this.convergencePerS = convergencePerS;
        this.jumpMPerS = jumpMPerS;
        this.contrastK = contrastK;
        this.searchFromM = searchFromM;
        this.searchToM = searchToM;
    }

    public NearSurfaceSection section() {
        return section;
    }

    public FrontCriteria criteria() {
        return criteria;
    }

    /** True for front passages (nonlinear model), false for onshore-flow onsets (linear theory has no front). */
    public boolean fronts() {
        return section.fronts();
    }

    /** The definitions line of a summary: exactly what this track computed. */
    public String definitions() {
        return criteria.describe(section.fronts(), section.heightM());
    }

    /** Per time: landward edge of the onshore flow connected to the coast, m (NaN where the coast is not onshore). */
    public double reachM(int n) {
        return reachM[n];
    }

    /** Per time: the front, m (NaN where none passes the criteria, and always for linear theory). */
    public double frontXM(int n) {
        return frontXM[n];
    }

    /** Per time: the leading edge the definitions use: the front, or for linear theory the onshore reach, m (NaN = none). */
    public double edgeM(int n) {
        return section.fronts() ? frontXM[n] : reachM[n];
    }

    /** Per time: convergence -du/dx at the candidate front, 1/s (NaN where not evaluated). */
    public double convergencePerS(int n) {
        return convergencePerS[n];
    }

    /** Per time: drop of the mean cross-shore wind across the candidate front, m/s (NaN where not evaluated). */
    public double jumpMPerS(int n) {
        return jumpMPerS[n];
    }

    /** Per time: theta-v ahead minus behind the candidate front, K (NaN where not evaluated). */
    public double thetaVContrastK(int n) {
        return contrastK[n];
    }

    /** The columns searched: {first, last} x, m. */
    public double[] searchedM() {
        return new double[] {searchFromM, searchToM};
    }

    private String edgeName() {
        return section.fronts() ? "front" : "onshore flow";
    }

    /** Onset at the coast: the arrival at x = 0. */
    public Arrival onsetAtCoast() {
        return arrivalAt(0.0);
    }

    /** THE arrival at a place x (m inland; negative offshore): see the class comment. */
    public Arrival arrivalAt(double xM) {
        boolean f = section.fronts();
        if (xM < searchFromM || xM > searchToM) {
            return Arrival.none(f, "outside the searched zone (" + km(searchFromM) + " to " + km(searchToM) + " km)");
        }
        double[] t = section.timeH();
        if (edgeM(0) >= xM) {
            return Arrival.none(f, f ? "already behind the front at the first output time" : "already onshore at the first output time");
        }
        for (int n = 1; n < t.length; n++) {
            double e = edgeM(n);
            if (!(e >= xM)) {
                continue;
            }
            // the last earlier time with an edge, if within MAX_GAP_H: the edge moved from there to here
            int m = n - 1;
            while (m > 0 && Double.isNaN(edgeM(m)) && t[n] - t[m - 1] <= MAX_GAP_H + 1e-9) {
                m--;
            }
            double prev = edgeM(m);
            if (!Double.isNaN(prev) && e > prev) {
                return new Arrival(t[m] + (xM - prev) / (e - prev) * (t[n] - t[m]), 0.5 * (t[n] - t[m]), f, null);
            }
            double half = 0.5 * (t[n] - t[n - 1]);
            if (!f) {
                // the onshore flow came from the sea: when the onshore margin at x itself crossed zero
                double m0 = onshoreMargin(n - 1, xM);
                double m1 = onshoreMargin(n, xM);
                if (m0 < 0 && m1 >= 0) {
                    return new Arrival(t[n - 1] + m0 / (m0 - m1) * (t[n] - t[n - 1]), half, false, null);
                }
            }
            return new Arrival(t[n - 1] + half, half, f, null);
        }
        if (f && !anyFront()) {
            return Arrival.none(true, "no front forms");
        }
        return Arrival.none(f, "the " + edgeName() + " never gets there in the output window");
    }

    /** The onshore margin ({@link FrontTracker#margin}) at x, linear between columns, m/s. */
    private double onshoreMargin(int n, double xM) {
        double[] x = section.xM();
        int i = (int) Math.floor((xM - x[0]) / section.dxM());
        i = Math.max(0, Math.min(x.length - 2, i));
        double w = Math.max(0, Math.min(1, (xM - x[i]) / (x[i + 1] - x[i])));
        double[] u = section.totalCrossShoreMPerS()[n];
        double[] ub = section.breezeCrossShoreMPerS()[n];
        double[] v = section.totalAlongshoreMPerS() == null ? null : section.totalAlongshoreMPerS()[n];
        double tan = Math.tan(Math.toRadians(criteria.onshoreHalfWidthDeg()));
        return (1 - w) * FrontTracker.margin(u, ub, v, i, criteria, tan) + w * FrontTracker.margin(u, ub, v, i + 1, criteria, tan);
    }

    private boolean anyFront() {
        for (double v : frontXM) {
            if (!Double.isNaN(v)) {
                return true;
            }
        }
        return false;
    }

    /**
     * Maximum inland penetration: the farthest the leading edge gets, m; none when no front forms (or, in linear
     * theory, no onshore flow reaches the coast); a lower bound when it reaches the landward end of the search.
     */
    public Extent maxPenetration() {
        int best = -1;
        for (int n = 0; n < reachM.length; n++) {
            double e = edgeM(n);
            if (!Double.isNaN(e) && (best < 0 || e > edgeM(best))) {
                best = n;
            }
        }
        if (best < 0) {
            return Extent.none(section.fronts() ? "no front forms" : "no onshore flow at the coast");
        }
        double e = edgeM(best);
        double dx = section.dxM();
        boolean atLimit = e >= searchToM - 1.5 * dx;
        for (int n = best; n < reachM.length && !atLimit; n++) {
            // the onshore flow behind it reached the end of the search later: the front may have gone on beyond
            atLimit = reachAtLimit[n];
        }
        if (section.fronts()) {
            // the ahead window of a front near the end of the search is clipped: treat within a window as the limit
            atLimit |= e >= searchToM - criteria.sideWindowM();
        }
        return new Extent(e, section.timeH()[best], e, atLimit, atLimit ? section.zone().landwardLimit() : null, null);
    }

    /**
     * The largest breeze (total minus ambient) cross-shore wind in the searched zone over all times, m/s, and where
     * and when; a lower bound when it lies at an end of the zone.
     */
    public Extent peakBreeze() {
        double[] x = section.xM();
        double best = Double.NEGATIVE_INFINITY;
        int bn = -1;
        int bi = -1;
        for (int n = 0; n < section.times(); n++) {
            double[] row = section.breezeCrossShoreMPerS()[n];
            for (int i = 0; i < x.length; i++) {
                if (x[i] < searchFromM || x[i] > searchToM) {
                    continue;
                }
                if (row[i] > best) {
                    best = row[i];
                    bn = n;
                    bi = i;
                }
            }
        }
        if (bn < 0) {
            return Extent.none("no columns in the searched zone");
        }
        double dx = section.dxM();
        boolean lo = x[bi] <= searchFromM + 0.5 * dx;
        boolean hi = x[bi] >= searchToM - 0.5 * dx;
        String limit = lo ? section.zone().seawardLimit() : hi ? section.zone().landwardLimit() : null;
        return new Extent(best, section.timeH()[bn], x[bi], lo || hi, limit, null);
    }

    /**
     * The speed implied by the arrivals at two places (a nearer the coast than b or not): resolved only when both
     * exist and their times differ by more than the sum of their uncertainties.
     */
    public static ImpliedSpeed impliedSpeed(Arrival a, double xaM, Arrival b, double xbM) {
        if (!a.exists() || !b.exists()) {
            return new ImpliedSpeed(null, "not resolved: no arrival at " + (a.exists() ? "the second" : "the first") + " place");
        }
        double dt = b.timeH() - a.timeH();
        double tol = a.uncertaintyH() + b.uncertaintyH();
        if (!(Math.abs(dt) > tol)) {
            return new ImpliedSpeed(null, String.format(java.util.Locale.ROOT,
                    "not resolved: the arrivals differ by %.0f min, within their timing uncertainty (+/- %.0f min)", Math.abs(dt) * 60,
                    tol * 60));
        }
        return new ImpliedSpeed((xbM - xaM) / (dt * 3600.0), null);
    }

    private static String km(double m) {
        return String.format(java.util.Locale.ROOT, "%.0f", m / 1000.0);
    }
}
