package org.littoral.scenarios.plan;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Scores candidate site sets from per-member, per-site outcomes. Pure counting: no model, no I/O.
 *
 * <p>The ranking score weights the three campaign goals: resolving the propagation speed between sites
 * (0.5), catching the passage at all (0.3), and separating a bay breeze from the sea breeze (0.2, only on
 * coasts with a bay; otherwise the weights are 0.6 / 0.4). Each part is a probability that cannot fall
 * when a site is added, so neither can the score.
 */
public final class PlanScorer {
    private PlanScorer() {
    }

    /**
     * @param outcomes outcomes[member][site] for the sites of one set and one cadence option
     * @param distancesKm inland distance of each site in the set
     * @param hasBay whether the coast has a bay (separation is scored)
     */
    public static SiteSetScore score(SiteOutcome[][] outcomes, List<Double> distancesKm, String cadence,
                                     boolean hasBay, int flightsPerDay, PlanCriteria c) {
        int members = outcomes.length;
        int nSites = distancesKm.size();
        int any = 0;
        int speed = 0;
        int separated = 0;
        long sitesCaught = 0;
        for (SiteOutcome[] row : outcomes) {
            if (row.length != nSites) {
                throw new IllegalArgumentException("outcome row has " + row.length + " sites, expected " + nSites);
            }
            boolean anyHere = false;
            boolean sepHere = false;
            for (SiteOutcome o : row) {
                if (o.captured(c)) {
                    anyHere = true;
                    sitesCaught++;
                }
                if (hasBay && o.separatedBayAndSea()) {
                    sepHere = true;
                }
            }
            any += anyHere ? 1 : 0;
            separated += sepHere ? 1 : 0;
            speed += speedResolved(row, distancesKm, c) ? 1 : 0;
        }
        Proportion pAny = Proportion.of(any, members);
        Proportion pSpeed = Proportion.of(speed, members);
        Proportion pSep = hasBay ? Proportion.of(separated, members) : null;
        double expected = members == 0 ? 0.0 : (double) sitesCaught / members;
        return new SiteSetScore(List.copyOf(distancesKm), cadence, pAny, expected, pSpeed, pSep, flightsPerDay,
                rankingScore(pAny, pSpeed, pSep));
    }

    /** Weighted score: 0.5 speed + 0.3 capture + 0.2 separation with a bay; 0.6 speed + 0.4 capture without. */
    public static double rankingScore(Proportion any, Proportion speed, Proportion separation) {
        if (separation == null) {
            return 0.6 * speed.estimate() + 0.4 * any.estimate();
        }
        return 0.5 * speed.estimate() + 0.3 * any.estimate() + 0.2 * separation.estimate();
    }

    /** True when some pair of sites both capture the passage and their implied speed matches the model's. */
    static boolean speedResolved(SiteOutcome[] row, List<Double> distancesKm, PlanCriteria c) {
        for (int a = 0; a < row.length; a++) {
            for (int b = a + 1; b < row.length; b++) {
                SiteOutcome oa = row[a];
                SiteOutcome ob = row[b];
                double dxKm = Math.abs(distancesKm.get(b) - distancesKm.get(a));
                if (dxKm <= 0 || !oa.captured(c) || !ob.captured(c)) {
                    continue;
                }
                double trueDt = Math.abs(ob.truthClockH() - oa.truthClockH());
                double obsDt = Math.abs(ob.detectedClockH() - oa.detectedClockH());
                if (trueDt <= 0 || obsDt <= 0) {
                    continue;
                }
                double trueSpeed = dxKm / trueDt;
                double obsSpeed = dxKm / obsDt;
                if (Math.abs(obsSpeed - trueSpeed) <= c.speedRelativeTolerance() * trueSpeed) {
                    return true;
                }
            }
        }
        return false;
    }

    /** All k-subsets of the candidate indices 0..n-1, in lexicographic order (allocates). */
    public static List<int[]> combinations(int n, int k) {
        List<int[]> out = new ArrayList<>();
        if (k <= 0 || k > n) {
            return out;
        }
        int[] idx = new int[k];
        for (int i = 0; i < k; i++) {
            idx[i] = i;
        }
        while (true) {
            out.add(idx.clone());
            int i = k - 1;
            while (i >= 0 && idx[i] == n - k + i) {
                i--;
            }
            if (i < 0) {
                return out;
            }
            idx[i]++;
            for (int j = i + 1; j < k; j++) {
                idx[j] = idx[j - 1] + 1;
            }
        }
    }

    /** Sorts best first: by score, then by fewer flights, then by nearer sites (cheaper logistics). */
    public static List<SiteSetScore> rank(List<SiteSetScore> scores) {
        List<SiteSetScore> sorted = new ArrayList<>(scores);
        sorted.sort(Comparator.comparingDouble(SiteSetScore::score).reversed()
                .thenComparingInt(SiteSetScore::flightsPerDay)
                .thenComparingDouble(s -> s.distancesKm().stream().mapToDouble(Double::doubleValue).sum()));
        return sorted;
    }
}
