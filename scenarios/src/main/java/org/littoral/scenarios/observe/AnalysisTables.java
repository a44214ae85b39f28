package org.littoral.scenarios.observe;

import java.util.Locale;
import java.util.stream.Collectors;
import org.littoral.scenarios.analysis.AnalysisResult;
import org.littoral.scenarios.analysis.SiteDayResult;
import org.littoral.scenarios.analysis.composite.BoxStats;
import org.littoral.scenarios.analysis.composite.CompositeRow;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.metrics.DistributionRow;
import org.littoral.scenarios.analysis.metrics.PassageResponse;
import org.littoral.scenarios.analysis.stats.ComparisonRow;
import org.littoral.scenarios.output.Csv;

/**
 * The analysis chain's result as tidy CSV tables (units in the column names). The same tables are
 * written for observed profiles ({@code littoral observe}) and for synthetic soundings
 * ({@code littoral compare}), so the two can be set side by side.
 */
public final class AnalysisTables {
    private AnalysisTables() {
    }

    public static String siteDays(AnalysisResult r) {
        StringBuilder sb = new StringBuilder("day,site,profiles,first_local_h,last_local_h,passages,onshore_passages,"
                + "first_onshore_local_h,breeze_type,ambient_east_m_per_s,ambient_north_m_per_s,ambient_source,attributes\n");
        for (SiteDayResult d : r.siteDays()) {
            double[] t = d.siteDay().timeHours();
            Passage p = d.firstOnshorePassage();
            long onshore = d.passages().stream().filter(Passage::turnsOnshore).count();
            sb.append(Csv.field(d.siteDay().day())).append(',').append(Csv.field(d.siteDay().site())).append(',').append(t.length).append(',')
                    .append(num(t.length == 0 ? Double.NaN : t[0])).append(',').append(num(t.length == 0 ? Double.NaN : t[t.length - 1]))
                    .append(',').append(d.passages().size()).append(',').append(onshore).append(',')
                    .append(num(p == null ? Double.NaN : p.timeHours())).append(',').append(d.breezeType().name()).append(',')
                    .append(num(d.ambientWind()[0])).append(',').append(num(d.ambientWind()[1])).append(',').append(d.ambientSource())
                    .append(',').append(Csv.field(d.attributes().entrySet().stream().map(e -> e.getKey() + "=" + e.getValue())
                            .collect(Collectors.joining("; ")))).append('\n');
        }
        return sb.toString();
    }

    public static String passages(AnalysisResult r) {
        return passages(r, null);
    }

    /**
     * The passage table; with the campaign's local clock ({@code zone}) each passage also carries its ISO-8601 local
     * time with offset and its UTC time (days that are ISO dates only).
     */
    public static String passages(AnalysisResult r, java.time.ZoneId zone) {
        StringBuilder sb = new StringBuilder("day,site,ordinal,time_local_h,uncertainty_h,confidence,detectors,turns_onshore,kind,"
                + "direction_before_deg,direction_after_deg,cross_shore_before_m_per_s,cross_shore_after_m_per_s"
                + (zone != null ? ",time_local,time_utc" : "") + "\n");
        for (Passage p : r.passages()) {
            sb.append(Csv.field(p.day())).append(',').append(Csv.field(p.site())).append(',').append(p.ordinal()).append(',')
                    .append(num(p.timeHours())).append(',').append(num(p.uncertaintyHours())).append(',').append(num(p.confidence()))
                    .append(',').append(Csv.field(String.join(" ", p.detectors()))).append(',').append(p.turnsOnshore()).append(',')
                    .append(p.kind().name()).append(',').append(num(p.directionBeforeDeg())).append(',').append(num(p.directionAfterDeg()))
                    .append(',').append(num(p.crossShoreBeforeMPerS())).append(',').append(num(p.crossShoreAfterMPerS()));
            if (zone != null) {
                String[] lu = localAndUtc(p.day(), p.timeHours(), zone);
                sb.append(',').append(lu[0]).append(',').append(lu[1]);
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    /** {ISO local date-time with offset, ISO UTC} of a local clock time on an ISO day; empty cells for other day labels. */
    public static String[] localAndUtc(String day, double hours, java.time.ZoneId zone) {
        try {
            java.time.LocalDateTime t = java.time.LocalDate.parse(day).atStartOfDay().plusNanos(Math.round(hours * 3.6e12));
            java.time.ZonedDateTime z = t.atZone(zone);
            return new String[] {z.toOffsetDateTime().withNano(0).toString(),
                    z.toInstant().atOffset(java.time.ZoneOffset.UTC).withNano(0).toString()};
        } catch (java.time.format.DateTimeParseException e) {
            return new String[] {"", ""};
        }
    }

    public static String responses(AnalysisResult r) {
        StringBuilder sb = new StringBuilder("day,site,passage,passage_local_h,layer_m,variable,unit,n_pre,n_post,pre_mean,post_mean,"
                + "change,tendency_per_h,reference,anomaly,change_standardised\n");
        for (PassageResponse x : r.responses()) {
            Passage p = x.passage();
            sb.append(Csv.field(p.day())).append(',').append(Csv.field(p.site())).append(',').append(p.ordinal()).append(',')
                    .append(num(p.timeHours())).append(',').append(x.layer().label()).append(',').append(x.variable().column()).append(',')
                    .append(Csv.field(x.variable().unit())).append(',').append(x.nPre()).append(',').append(x.nPost()).append(',')
                    .append(num(x.preMean())).append(',').append(num(x.postMean())).append(',').append(num(x.change())).append(',')
                    .append(num(x.tendencyPerHour())).append(',').append(num(x.referenceValue())).append(',').append(num(x.anomaly()))
                    .append(',').append(num(x.changeStandardised())).append('\n');
        }
        return sb.toString();
    }

    public static String distributions(AnalysisResult r) {
        StringBuilder sb = new StringBuilder("layer_m,variable,metric,n,mean,sd,skewness,excess_kurtosis\n");
        for (DistributionRow d : r.distributions()) {
            sb.append(d.layer().label()).append(',').append(d.variable().column()).append(',').append(Csv.field(d.metric())).append(',')
                    .append(d.moments().n()).append(',').append(num(d.moments().mean())).append(',').append(num(d.moments().sd()))
                    .append(',').append(num(d.moments().skewness())).append(',').append(num(d.moments().excessKurtosis())).append('\n');
        }
        return sb.toString();
    }

    public static String composites(AnalysisResult r) {
        StringBuilder sb = new StringBuilder("composite,axis,variable,layer_m,anomaly,group,bin_centre_h,n,mean,min,q1,median,q3,max,"
                + "whisker_low,whisker_high,outliers\n");
        for (CompositeRow c : r.composites()) {
            BoxStats b = c.box();
            sb.append(Csv.field(c.spec().label())).append(',').append(c.spec().axis().name()).append(',').append(c.spec().variable().column())
                    .append(',').append(c.spec().layer().label()).append(',').append(c.spec().anomaly()).append(',').append(Csv.field(c.group()))
                    .append(',').append(num(c.binCentreHours())).append(',').append(b.n()).append(',').append(num(b.mean())).append(',')
                    .append(num(b.min())).append(',').append(num(b.q1())).append(',').append(num(b.median())).append(',')
                    .append(num(b.q3())).append(',').append(num(b.max())).append(',').append(num(b.whiskerLow())).append(',')
                    .append(num(b.whiskerHigh())).append(',').append(b.outliers()).append('\n');
        }
        return sb.toString();
    }

    public static String comparisons(AnalysisResult r) {
        StringBuilder sb = new StringBuilder("metric,attribute,group_a,group_b,n_a,n_b,mean_a,mean_b,difference,test,statistic,"
                + "degrees_of_freedom,p_value,p_holm,skewness_a,skewness_b,jarque_bera_p_a,jarque_bera_p_b,why\n");
        for (ComparisonRow c : r.comparisons()) {
            sb.append(Csv.field(c.metric())).append(',').append(Csv.field(c.attribute())).append(',').append(Csv.field(c.groupA())).append(',')
                    .append(Csv.field(c.groupB())).append(',').append(c.nA()).append(',').append(c.nB()).append(',').append(num(c.meanA()))
                    .append(',').append(num(c.meanB())).append(',').append(num(c.difference())).append(',').append(c.test().name())
                    .append(',').append(num(c.statistic())).append(',').append(num(c.degreesOfFreedom())).append(',')
                    .append(num(c.pValue())).append(',').append(num(c.pHolm())).append(',')
                    .append(num(c.diagnosticsA() == null ? Double.NaN : c.diagnosticsA().skewness())).append(',')
                    .append(num(c.diagnosticsB() == null ? Double.NaN : c.diagnosticsB().skewness())).append(',')
                    .append(num(c.diagnosticsA() == null ? Double.NaN : c.diagnosticsA().jarqueBeraP())).append(',')
                    .append(num(c.diagnosticsB() == null ? Double.NaN : c.diagnosticsB().jarqueBeraP())).append(',')
                    .append(Csv.field(c.why())).append('\n');
        }
        return sb.toString();
    }

    static String num(double v) {
        return Double.isNaN(v) ? "" : String.format(Locale.ROOT, "%.5g", v);
    }

}
