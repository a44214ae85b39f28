package org.littoral.scenarios.observe;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.AnalysisResult;
import org.littoral.scenarios.analysis.SiteDayResult;
import org.littoral.scenarios.analysis.TimeHeightGrid;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.output.SafeNames;
import org.littoral.scenarios.report.CaptionedFigure;
import org.littoral.scenarios.report.ClockTime;
import org.littoral.scenarios.report.ColorMap;
import org.littoral.scenarios.report.Figure;
import org.littoral.scenarios.report.FigureGrid;
import org.littoral.scenarios.report.LineFigure;
import org.littoral.scenarios.report.Series;
import org.littoral.scenarios.report.TimeHeightPanel;

/**
 * The observed flights themselves, per site-day: profile plots (temperature and dewpoint, theta and theta-e, wind
 * speed, wind direction against height) and time-height sections (cross-shore wind, theta; the drawing shared with
 * compare). A campaign of one or a few site-days shows every flight; a longer one shows, for a few site-days, the
 * flights on either side of each onshore passage.
 */
public final class FlightFigures {
    private FlightFigures() {
    }

    /** Up to this many site-days, every flight of every site-day is drawn (one or a few days of one or two sites). */
    static final int FEW_SITE_DAYS = 4;
    /** A longer campaign: at most this many site-days get figures. */
    static final int MAX_SITE_DAYS_LONG = 4;
    /** A longer campaign: flights drawn on each side of an onshore passage. */
    static final int FLIGHTS_EACH_SIDE = 2;
    /** File name prefixes of these figures (the report places them in a section of their own). */
    static final String PROFILES_PREFIX = "flights-";
    static final String SECTION_PREFIX = "time-height-";

    /** Which site-days get figures and why: every site-day of a short campaign, else a choice (with the sentence saying so). */
    record Choice(List<SiteDayResult> siteDays, boolean everyFlight, String sentence) {
    }

    static Choice choose(AnalysisResult r) {
        List<SiteDayResult> all = r.siteDays();
        if (all.size() <= FEW_SITE_DAYS) {
            return new Choice(all, true, null);
        }
        List<SiteDayResult> withPassage = new ArrayList<>();
        for (SiteDayResult d : all) {
            if (d.firstOnshorePassage() != null) {
                withPassage.add(d);
            }
        }
        // the clearest passages first (detectors' agreement, then the larger onshore gain), then shown in date order
        withPassage.sort(Comparator.comparingDouble((SiteDayResult d) -> -d.firstOnshorePassage().confidence())
                .thenComparingDouble(d -> -(d.firstOnshorePassage().crossShoreAfterMPerS() - d.firstOnshorePassage().crossShoreBeforeMPerS()))
                .thenComparing(d -> d.siteDay().day()).thenComparing(d -> d.siteDay().site()));
        List<SiteDayResult> chosen = new ArrayList<>(withPassage.subList(0, Math.min(MAX_SITE_DAYS_LONG, withPassage.size())));
        chosen.sort(Comparator.comparing((SiteDayResult d) -> d.siteDay().day()).thenComparing(d -> d.siteDay().site()));
        String sentence = String.format(Locale.ROOT, "The campaign has %d site-days (%d with an onshore passage): the flight "
                + "profiles and time-height sections below show %d of them, those whose first onshore passage the detectors agree on "
                + "most and that turn the wind most strongly onshore; the profiles show the %d flights on either side of each "
                + "onshore passage. passages.csv lists every passage.", all.size(), withPassage.size(), chosen.size(), FLIGHTS_EACH_SIDE);
        return new Choice(chosen, false, sentence);
    }

    /** Profile and section figures of the chosen site-days, in date and site order. */
    static List<CaptionedFigure> all(AnalysisResult r, Coast coast) {
        Choice c = choose(r);
        List<CaptionedFigure> out = new ArrayList<>();
        for (SiteDayResult d : c.siteDays()) {
            if (d.siteDay().size() == 0) {
                continue;
            }
            out.add(profiles(d, coast, c.everyFlight()));
            if (d.siteDay().size() >= 2) {
                out.add(section(d, coast));
            }
        }
        return out;
    }

    static String fileSuffix(SiteDayResult d) {
        return SafeNames.fileName(d.siteDay().day() + "-" + d.siteDay().site()) + ".png";
    }

    /** Indices of the flights drawn: all of them, or those on either side of each onshore passage. */
    static List<Integer> flightsShown(SiteDayResult d, boolean everyFlight) {
        int n = d.siteDay().size();
        List<Integer> idx = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            boolean near = everyFlight;
            for (Passage p : d.passages()) {
                if (p.turnsOnshore() && i > p.lastBefore() - FLIGHTS_EACH_SIDE && i < p.firstAfter() + FLIGHTS_EACH_SIDE) {
                    near = true;
                }
            }
            if (near) {
                idx.add(i);
            }
        }
        return idx;
    }

    /** Temperature and dewpoint, theta and theta-e, wind speed and wind direction against height: one line per flight. */
    static CaptionedFigure profiles(SiteDayResult d, Coast coast, boolean everyFlight) {
        List<Profile> ps = d.siteDay().profiles();
        double[] t = d.siteDay().timeHours();
        List<Integer> shown = flightsShown(d, everyFlight);
        List<Passage> onshore = d.passages().stream().filter(Passage::turnsOnshore).toList();
        LineFigure.Builder temp = panel("Temperature (solid), dewpoint (dashed)", "temperature, dewpoint", "\u00b0C");
        LineFigure.Builder theta = panel("\u03b8 (solid), \u03b8e (dashed)", "\u03b8, \u03b8e", "K");
        LineFigure.Builder speed = panel("Wind speed", "wind speed", "m/s");
        LineFigure.Builder dir = panel("Wind direction (from)", "wind from", "deg").xRange(0, 360);
        dir.event(coast.bearingLandToSeaDeg(), "onshore");
        double t0 = t[shown.get(0)];
        double t1 = t[shown.get(shown.size() - 1)];
        double zTop = 0;
        List<String> legendTimes = new ArrayList<>();
        for (int n = 0; n < shown.size(); n++) {
            int i = shown.get(n);
            Profile p = ps.get(i);
            double[] z = p.heightM();
            for (double h : z) {
                if (Double.isFinite(h)) {
                    zTop = Math.max(zTop, h);
                }
            }
            java.awt.Color col = ColorMap.sequential().color(t1 > t0 ? 0.85 * (t[i] - t0) / (t1 - t0) : 0.0);
            String name = ClockTime.hhmm(t[i]) + tag(i, onshore);
            // a legend entry for the first and last flight and the flights on either side of an onshore passage
            boolean inLegend = n == 0 || n == shown.size() - 1 || !tag(i, onshore).isEmpty();
            if (inLegend) {
                legendTimes.add(name);
            }
            int m = z.length;
            double[] tc = new double[m];
            double[] tdc = new double[m];
            double[] spd = new double[m];
            double[] wd = new double[m];
            for (int k = 0; k < m; k++) {
                tc[k] = p.temperatureK()[k] - 273.15;
                tdc[k] = p.dewpointK()[k] - 273.15;
                spd[k] = p.windSpeed(k);
                wd[k] = p.windDirectionDeg(k);
            }
            temp.series(legend(Series.of(name, tc, z).color(col).width(1.4f), inLegend));
            temp.series(Series.of(name + " dewpoint", tdc, z).color(col).width(1.4f).dashed().hideInLegend());
            theta.series(Series.of(name, p.thetaK(), z).color(col).width(1.4f).hideInLegend());
            theta.series(Series.of(name + " theta-e", p.thetaEK(), z).color(col).width(1.4f).dashed().hideInLegend());
            speed.series(Series.of(name, spd, z).color(col).width(1.4f).hideInLegend());
            double[][] hz = AnalysisFigures.breakWraps(z, wd); // a direction turning through north breaks the line
            dir.series(Series.of(name, hz[1], hz[0]).color(col).width(1.4f).hideInLegend());
        }
        String site = d.siteDay().site();
        String day = d.siteDay().day();
        Figure grid = FigureGrid.of("Flights at " + site + " on " + day, List.of(temp.build(), theta.build(), speed.build(), dir.build()), 2);
        StringBuilder cap = new StringBuilder();
        cap.append(String.format(Locale.ROOT, "Observed profiles at %s on %s: %s %d flight%s from %s to %s local time, up to %.0f m "
                        + "above ground. Colour runs with the flight time from dark purple (first) to green (last). Solid lines: "
                        + "temperature and potential temperature \u03b8; dashed: dewpoint and equivalent potential temperature \u03b8e "
                        + "(Bolton 1980). Wind speed in m/s; wind direction is where the wind blows from, the dashed line marks onshore "
                        + "(from %.0f deg).", site, day, everyFlight ? "all" : "the", shown.size(), shown.size() == 1 ? "" : "s",
                ClockTime.hhmm(t0), ClockTime.hhmm(t1), zTop, coast.bearingLandToSeaDeg()));
        if (onshore.isEmpty()) {
            cap.append(" No passage turned the wind onshore on this site-day.");
        } else {
            List<String> ps2 = new ArrayList<>();
            for (Passage p : onshore) {
                ps2.add(ClockTime.hhmmWithin(p.timeHours(), p.uncertaintyHours()) + " (flights at " + ClockTime.hhmm(t[p.lastBefore()])
                        + " and " + ClockTime.hhmm(t[p.firstAfter()]) + " on either side)");
            }
            cap.append(" Onshore passage").append(onshore.size() > 1 ? "s" : "").append(": ").append(String.join("; ", ps2))
                    .append("; in the legend, 'before' and 'after' mark those flights.");
        }
        if (everyFlight && legendTimes.size() < shown.size()) {
            cap.append(" The legend names the first and last flights and those beside a passage.");
        }
        return new CaptionedFigure(PROFILES_PREFIX + fileSuffix(d), grid, cap.toString());
    }

    private static Series legend(Series s, boolean inLegend) {
        return inLegend ? s : s.hideInLegend();
    }

    /** " before" / " after" for the flights beside an onshore passage, else empty. */
    private static String tag(int i, List<Passage> onshore) {
        for (Passage p : onshore) {
            if (i == p.lastBefore()) {
                return " before";
            }
            if (i == p.firstAfter()) {
                return " after";
            }
        }
        return "";
    }

    private static LineFigure.Builder panel(String title, String label, String unit) {
        return LineFigure.builder().size(480, 420).title(title).x(label, unit).y("height above ground", "m");
    }

    /** Cross-shore wind and theta against local time and height, every flight one column, passages as vertical lines. */
    static CaptionedFigure section(SiteDayResult d, Coast coast) {
        TimeHeightGrid g = TimeHeightGrid.of(d.siteDay().profiles(), coast);
        List<TimeHeightPanel.Event> events = new ArrayList<>();
        int onshore = 0;
        for (Passage p : d.passages()) {
            events.add(new TimeHeightPanel.Event(p.timeHours(), p.turnsOnshore() ? "onshore " + ClockTime.hhmm(p.timeHours()) : ""));
            onshore += p.turnsOnshore() ? 1 : 0;
        }
        String site = d.siteDay().site();
        String day = d.siteDay().day();
        Figure u = TimeHeightPanel.of("Cross-shore wind (onshore +)", g.timeH(), g.heightM(), g.crossShoreMPerS(),
                "Cross-shore wind (onshore +)", "m/s", TimeHeightPanel.symmetricRange(g.crossShoreMPerS()), true, events, 620, 380);
        Figure th = TimeHeightPanel.of("Potential temperature \u03b8", g.timeH(), g.heightM(), g.thetaK(),
                "Potential temperature \u03b8", "K", TimeHeightPanel.range(g.thetaK()), false, events, 620, 380);
        double[] tt = g.timeH();
        double maxGap = 0;
        for (int j = 1; j < tt.length; j++) {
            maxGap = Math.max(maxGap, tt[j] - tt[j - 1]);
        }
        String cap = String.format(Locale.ROOT, "Time-height sections of the observations at %s on %s: %d flights from %s to %s "
                        + "local time, each flight one column of %.0f m bins from %.0f to %.0f m (cells reach half-way to the "
                        + "neighbouring flights; the longest gap between flights is %d min). Left: cross-shore wind, onshore positive "
                        + "(red), offshore negative (blue), in m/s; right: potential temperature \u03b8 in K. Vertical lines: the %d "
                        + "detected passage%s, onshore ones labelled with their time. Grey: no data.", site, day, tt.length,
                ClockTime.hhmm(tt[0]), ClockTime.hhmm(tt[tt.length - 1]), g.heightM().length > 1 ? g.heightM()[1] - g.heightM()[0] : 0,
                g.heightM()[0], g.heightM()[g.heightM().length - 1], Math.round(maxGap * 60), d.passages().size(),
                d.passages().size() == 1 ? "" : "s") + (onshore == 0 ? " None turns the wind onshore." : "");
        return new CaptionedFigure(SECTION_PREFIX + fileSuffix(d), FigureGrid.of("Time-height sections at " + site + " on " + day,
                List.of(u, th), 2), cap);
    }
}
