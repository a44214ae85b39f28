package org.littoral.scenarios.demo;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.littoral.model.thermo.Thermo;

/**
 * The INVENTED demo campaign: a summer season of days on the invented Quillmarsh Reach coast, drawn
 * from one seed. {@link #generate(long)} decides each day's ambient flow, background and prescribed
 * fronts; {@link DemoFlights} turns a day into flights and {@link DemoDataWriter} into files.
 *
 * <p>Day mix (36 days): offshore-flow ("pure") breeze days, some with a bay breeze first and one whose
 * front stalls between the sites; corkscrew and backdoor days (shore-parallel flow with land on the left
 * or right looking downwind, Northern Hemisphere); null days with onshore synoptic flow (a breeze front
 * does not form in onshore flow above about 3 m/s: Crosman &amp; Horel 2010, from memory), with offshore
 * flow above about 11 m/s (Arritt 1993) or under overcast skies; a few convective afternoons.
 */
public record DemoCampaign(long seed, List<DemoDay> days) {
    public static final long DEFAULT_SEED = 20310615L;
    public static final LocalDate SEASON_START = LocalDate.of(2031, 6, 15);
    public static final int SEASON_LENGTH_DAYS = 70;
    /** Fraction of flights lost at random (battery, airspace holds, crew). */
    static final double MISSING_FLIGHT_FRACTION = 0.05;

    private enum Kind {
        PURE("pure", 7), PURE_BAY("pure", 3), PURE_STALL("pure", 1), STRONG_OFFSHORE("pure", 2),
        OVERCAST_PURE("pure", 1), CORKSCREW("corkscrew", 7), CORKSCREW_BAY("corkscrew", 1),
        BACKDOOR("backdoor", 6), BACKDOOR_STALL("backdoor", 1), OVERCAST_BACKDOOR("backdoor", 1),
        SYNOPTIC("synoptic", 6);

        final String breezeType;
        final int count;

        Kind(String breezeType, int count) {
            this.breezeType = breezeType;
            this.count = count;
        }

        boolean hasFront() {
            return this != STRONG_OFFSHORE && this != OVERCAST_PURE && this != OVERCAST_BACKDOOR && this != SYNOPTIC;
        }

        boolean bayFirst() {
            return this == PURE_BAY || this == CORKSCREW_BAY;
        }

        boolean stalls() {
            return this == PURE_STALL || this == BACKDOOR_STALL;
        }
    }

    /** Deterministic in the seed: the same seed gives the same campaign, bit for bit. */
    public static DemoCampaign generate(long seed) {
        Random rng = new Random(seed);
        List<Kind> kinds = new ArrayList<>();
        for (Kind k : Kind.values()) {
            for (int i = 0; i < k.count; i++) {
                kinds.add(k);
            }
        }
        Collections.shuffle(kinds, rng);
        // Convective afternoons on five breeze days and one synoptic day.
        boolean[] convective = new boolean[kinds.size()];
        int breezeConv = 0;
        int synConv = 0;
        for (int i = 0; i < kinds.size(); i++) {
            Kind k = kinds.get(i);
            if (k.hasFront() && !k.stalls() && breezeConv < 5 && rng.nextDouble() < 0.3) {
                convective[i] = true;
                breezeConv++;
            } else if (k == Kind.SYNOPTIC && synConv < 1) {
                convective[i] = true;
                synConv++;
            }
        }
        List<Integer> offsets = new ArrayList<>();
        for (int d = 0; d < SEASON_LENGTH_DAYS; d++) {
            offsets.add(d);
        }
        Collections.shuffle(offsets, rng);
        List<Integer> chosen = new ArrayList<>(offsets.subList(0, kinds.size()));
        Collections.sort(chosen);
        List<DemoDay> days = new ArrayList<>();
        for (int i = 0; i < kinds.size(); i++) {
            long daySeed = rng.nextLong();
            days.add(makeDay(SEASON_START.plusDays(chosen.get(i)), kinds.get(i), convective[i], daySeed));
        }
        return new DemoCampaign(seed, List.copyOf(days));
    }

    private static double uniform(Random r, double lo, double hi) {
        return lo + (hi - lo) * r.nextDouble();
    }

    private static double clampedGauss(Random r, double sd, double limit) {
        return Math.max(-limit, Math.min(limit, sd * r.nextGaussian()));
    }

    private static DemoDay makeDay(LocalDate date, Kind kind, boolean convective, long seed) {
        Random r = new Random(seed);
        double onshoreFrom = DemoCoast.BEARING_LAND_TO_SEA_DEG;
        double dir;
        double speed;
        switch (kind) {
            case PURE, PURE_BAY, PURE_STALL, STRONG_OFFSHORE, OVERCAST_PURE -> {
                dir = onshoreFrom + 180.0 + clampedGauss(r, 18.0, 35.0);
                speed = switch (kind) {
                    case PURE_BAY -> uniform(r, 1.0, 3.0);
                    case PURE_STALL -> uniform(r, 6.0, 8.0);
                    case STRONG_OFFSHORE -> uniform(r, 11.5, 14.0);
                    default -> uniform(r, 1.0, 5.0);
                };
            }
            // Northern Hemisphere: corkscrew has the land on the left looking downwind, i.e. (coast bearing 135)
            // wind from the south-west; backdoor has it on the right: wind from the north-east.
            case CORKSCREW, CORKSCREW_BAY -> {
                dir = onshoreFrom + 90.0 + clampedGauss(r, 12.0, 25.0);
                speed = uniform(r, 2.0, kind == Kind.CORKSCREW_BAY ? 3.5 : 7.0);
            }
            case BACKDOOR, BACKDOOR_STALL, OVERCAST_BACKDOOR -> {
                dir = onshoreFrom - 90.0 + clampedGauss(r, 12.0, 25.0);
                speed = uniform(r, 2.0, 7.0);
            }
            default -> {
                dir = onshoreFrom + clampedGauss(r, 12.0, 25.0);
                speed = uniform(r, 3.0, 8.0);
            }
        }
        dir = ((dir % 360.0) + 360.0) % 360.0;

        boolean overcast = kind == Kind.OVERCAST_PURE || kind == Kind.OVERCAST_BACKDOOR;
        double warming = overcast ? uniform(r, 1.5, 2.5) : kind == Kind.SYNOPTIC ? uniform(r, 2.0, 4.0) : uniform(r, 5.0, 8.0);
        double r0 = uniform(r, 8.5, 11.5) + (convective ? 2.0 : 0.0) + (kind == Kind.SYNOPTIC ? 1.0 : 0.0);
        DemoDay.Background bg = new DemoDay.Background(uniform(r, 1008.0, 1020.0), uniform(r, 291.0, 296.0),
                uniform(r, 4.5e-3, 7.0e-3), warming, r0, convective ? uniform(r, 14.0, 15.5) : Double.NaN);

        List<String> tags = new ArrayList<>();
        if (overcast) {
            tags.add("overcast");
        }
        if (kind == Kind.STRONG_OFFSHORE) {
            tags.add("strong-offshore");
        }
        if (kind.bayFirst()) {
            tags.add("bay-breeze-first");
        }
        if (kind.stalls()) {
            tags.add("front-stalled");
        }
        if (!kind.hasFront()) {
            tags.add("no-front");
        }

        double contrast = uniform(r, 1.5, 3.5);
        double depth = switch (kind.breezeType) {
            case "corkscrew" -> uniform(r, 500.0, 800.0);
            case "backdoor" -> uniform(r, 300.0, 500.0);
            default -> kind.stalls() ? uniform(r, 250.0, 400.0) : uniform(r, 350.0, 650.0);
        };
        double crossShore = crossShore(date, speed, dir);
        List<DemoDay.Front> fronts = new ArrayList<>();
        double[] dense = new double[DemoCoast.SITES.size()];
        if (kind.hasFront()) {
            // Front speed: Simpson & Britter (1980) against the ambient cross-shore wind, from memory:
            // U_f = 0.87 sqrt(g' h) + 0.59 U_x (U_x onshore positive), slowed by a random factor for
            // friction and mixing, kept in the 1-5 m/s range typical of sea-breeze fronts (Simpson 1994).
            double gPrime = Thermo.G * contrast / 300.0;
            double speedFront = uniform(r, 0.45, 0.7) * (0.87 * Math.sqrt(gPrime * depth) + 0.59 * crossShore);
            speedFront = Math.max(1.0, Math.min(5.0, speedFront));
            double onset = switch (kind.breezeType) {
                case "corkscrew" -> uniform(r, 9.5, 10.75);
                case "backdoor" -> uniform(r, 10.25, 11.5);
                default -> uniform(r, 9.75, 11.0) + 0.1 * Math.max(0.0, -crossShore);
            };
            if (kind.bayFirst()) {
                onset = Math.max(onset, uniform(r, 10.9, 11.75));
            }
            double x0 = DemoCoast.MARSH_4KM.inlandDistanceM();
            double x1 = DemoCoast.PLAIN_25KM.inlandDistanceM();
            double arrival0 = onset + x0 / speedFront / 3600.0;
            // Late afternoon is the end of operations: a front that would pass the inland site after
            // 16:30 is made faster, so that every inland passage has flights after it.
            double latest = 16.5;
            if (arrival0 + (x1 - x0) / speedFront / 3600.0 > latest) {
                speedFront = Math.min(5.0, (x1 - x0) / ((latest - arrival0) * 3600.0));
            }
            double arrival1 = arrival0 + (x1 - x0) / speedFront / 3600.0;
            double dirOffset = switch (kind.breezeType) {
                case "corkscrew" -> uniform(r, 10.0, 30.0);
                case "backdoor" -> -uniform(r, 10.0, 30.0);
                default -> clampedGauss(r, 8.0, 20.0);
            };
            if (kind.bayFirst()) {
                // Bay breeze from the bay's shore next to the site, well before the sea breeze arrives.
                double bayArrival = Math.min(uniform(r, 9.4, 10.4), arrival0 - 1.5);
                fronts.add(new DemoDay.Front(0, "bay_breeze", bayArrival, uniform(r, 0.8, 1.5), uniform(r, 150.0, 250.0),
                        DemoCoast.BAY_SHORE_BEARING_DEG + clampedGauss(r, 6.0, 12.0), uniform(r, 2.0, 3.5),
                        -0.7 + 0.4 * r.nextGaussian(), 0.4 + 0.3 * r.nextGaussian()));
            }
            fronts.add(new DemoDay.Front(0, "sea_breeze", arrival0, speedFront, depth,
                    onshoreFrom + dirOffset + clampedGauss(r, 5.0, 10.0), uniform(r, 3.5, 7.0),
                    -1.8 + 1.2 * r.nextGaussian(), 0.9 + 1.0 * r.nextGaussian()));
            if (!kind.stalls()) {
                fronts.add(new DemoDay.Front(1, "sea_breeze", arrival1, speedFront, depth,
                        onshoreFrom + dirOffset + clampedGauss(r, 5.0, 10.0), uniform(r, 3.0, 6.0),
                        -1.5 + 1.2 * r.nextGaussian(), 0.7 + 1.0 * r.nextGaussian()));
            } else {
                tags.add("max-penetration-km=" + Math.round(uniform(r, 8.0, 16.0)));
            }
            // The team expects the front with a forecast error of about half an hour.
            dense[0] = arrival0 + 0.5 * r.nextGaussian();
            dense[1] = arrival1 + 0.5 * r.nextGaussian();
        } else {
            dense[0] = 11.0 + 0.3 * r.nextGaussian();
            dense[1] = 14.5 + 0.3 * r.nextGaussian();
        }
        String type = breezeTypeOf(dir);
        return new DemoDay(date, dir, speed, type, convective, List.copyOf(tags), bg, contrast, depth,
                List.copyOf(fronts), dense, r.nextLong());
    }

    private static double crossShore(LocalDate date, double speed, double dirFrom) {
        double[] en = org.littoral.model.coast.Coast.eastNorthFromDirection(speed, dirFrom);
        return DemoCoast.coast(date.getDayOfYear()).crossShore(en[0], en[1]);
    }

    /**
     * Breeze type from the ambient wind direction relative to the coast, in quadrants centred on the
     * onshore, offshore and the two shore-parallel directions (our choice of sector boundaries). Northern
     * Hemisphere: corkscrew = land on the left looking downwind (Miller et al. 2003; Steele et al. 2015).
     */
    public static String breezeTypeOf(double directionFromDeg) {
        double rel = ((directionFromDeg - DemoCoast.BEARING_LAND_TO_SEA_DEG) % 360.0 + 360.0) % 360.0;
        if (rel < 45.0 || rel >= 315.0) {
            return "synoptic";
        }
        if (rel < 135.0) {
            return "corkscrew";
        }
        if (rel < 225.0) {
            return "pure";
        }
        return "backdoor";
    }

    public DemoDay day(LocalDate date) {
        for (DemoDay d : days) {
            if (d.date().equals(date)) {
                return d;
            }
        }
        throw new IllegalArgumentException("no demo day " + date + "; the campaign runs from " + days.get(0).date()
                + " to " + days.get(days.size() - 1).date());
    }
}
