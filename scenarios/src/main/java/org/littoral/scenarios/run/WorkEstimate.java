package org.littoral.scenarios.run;

import java.util.Locale;
import org.littoral.scenarios.input.InputText;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.scenario.Scenario;

/**
 * What a run of a scenario will hold in memory, counted from the sizes that drive it before anything is
 * allocated: the model's arrays (linear: four complex coefficient fields per time harmonic; nonlinear: its working
 * arrays and the snapshots it stores in single precision), the time-distance and site sections, the synthetic
 * soundings and the text of the CSV files. {@link #check} refuses, with the figure and what to change, a run that
 * will not fit in the memory the JVM may use, instead of dying half-way with an out-of-memory error.
 *
 * <p>The counts are upper bounds of the large arrays (the coefficients in {@link #BYTES_PER_DOUBLE} etc.);
 * {@code littoral bench memory-estimate} compares them with measured peaks.
 */
public final class WorkEstimate {
    static final int BYTES_PER_DOUBLE = 8;
    /** Working arrays of the nonlinear model per grid cell (about 80 arrays of nx x nz doubles, with spare). */
    static final int NONLINEAR_ARRAYS = 110;
    /** Stored fields per nonlinear snapshot (u, v, w, theta, r, p as float). */
    static final int SNAPSHOT_FIELDS = 6;
    /** Values per profile bin (height, p, T, RH, r, Td, wind, theta, theta-v, theta-e) and their CSV text. */
    static final int PROFILE_DOUBLES = 16;
    static final int SOUNDING_CSV_BYTES_PER_BIN = 4 * 110;
    static final int SECTION_CSV_BYTES_PER_CELL = 2 * 45;
    /** What the JVM itself, the libraries and the figures need besides the arrays counted here. */
    static final long BASE_BYTES = 96L << 20;

    private final Scenario scenario;
    private final long modelBytes;
    private final long sectionBytes;
    private final long soundingBytes;
    private final long profiles;
    private final long bins;
    private final long outputTimes;

    private WorkEstimate(Scenario s) {
        this.scenario = s;
        long nx = s.xGrid().nx();
        long nz = s.zGrid().size();
        Scenario.Output o = s.output();
        outputTimes = (long) Math.floor((o.endClockH() - o.startClockH()) / (o.stepMin() / 60.0) + 1e-9) + 1;
        if (s.kind() == Scenario.Kind.LINEAR) {
            // the classic heating is one sinusoid; the slab heating keeps the mean and every harmonic
            long nh = s.heating() instanceof org.littoral.model.linear.HeatingSpec.ClassicShape ? 1 : s.physics().harmonics() + 1L;
            // psi and u (real, imaginary) per harmonic, each array a "humongous" object that the collector stores in whole
            // regions (up to 1.6 times its size), plus buoyancy and pressure parts, 3 full snapshots for the peak and the
            // solution's cache of column harmonics (at most 64 MB)
            modelBytes = (long) (1.6 * 4 * nh * nx * nz + 3L * 6 * nx * nz + 12 * nh * nx) * BYTES_PER_DOUBLE
                    + Math.min(64L << 20, 1024L * nh * 12 * nz * BYTES_PER_DOUBLE);
        } else {
            double[] span = s.nonlinearSolarSpanHours();
            double storeS = Math.min(Scenario.NONLINEAR_STORE_MAX_S, o.stepMin() * 60.0);
            long stored = (long) Math.ceil(Math.max(0, span[1] - span[0]) * 3600.0 / storeS) + 2;
            modelBytes = NONLINEAR_ARRAYS * nx * nz * BYTES_PER_DOUBLE + stored * (SNAPSHOT_FIELDS * nx * nz + nx) * 4L;
        }
        long sites = s.sites().size();
        // near-surface sections (u, total u, total v, front) and the site columns (u, v, theta)
        sectionBytes = outputTimes * (6 * nx + 3 * sites * nz) * BYTES_PER_DOUBLE + outputTimes * nx * SECTION_CSV_BYTES_PER_CELL;
        long launches = s.flights().schedule().launchCountAtMost();
        profiles = launches * sites;
        bins = (long) Math.ceil(s.flights().sounding().ceilingM() / s.flights().sounding().binM());
        soundingBytes = profiles * bins * (PROFILE_DOUBLES * BYTES_PER_DOUBLE + SOUNDING_CSV_BYTES_PER_BIN);
    }

    /** The estimate for one scenario (allocates nothing large). */
    public static WorkEstimate of(Scenario s) {
        return new WorkEstimate(s);
    }

    /** Bytes one run needs, the JVM's own share included. */
    public long bytes() {
        return BASE_BYTES + modelBytes + sectionBytes + soundingBytes;
    }

    /** Bytes {@code concurrent} such runs need at once in one JVM, its own share counted once (a batch task's heap). */
    public long bytesFor(int concurrent) {
        return BASE_BYTES + (long) Math.max(1, concurrent) * runBytes();
    }

    /** Bytes of the run's own arrays, without the JVM's share (what each extra concurrent member adds). */
    public long runBytes() {
        return modelBytes + sectionBytes + soundingBytes;
    }

    /**
     * Bytes the run writes to disk, about: soundings (CSV and netCDF), the time-distance section, fields.nc (every
     * output time, six fields in single precision) and the figures.
     */
    public long outputBytes(boolean fieldsNc) {
        long nx = scenario.xGrid().nx();
        long nz = scenario.zGrid().size();
        return profiles * bins * (110 + 12 * 4) + outputTimes * nx * 45 + (fieldsNc ? outputTimes * nx * nz * 6 * 4 : 0)
                + (8L << 20);
    }

    /** Heap the JVM may still use: its limit minus what is in use now. */
    public static long availableBytes() {
        Runtime rt = Runtime.getRuntime();
        return rt.maxMemory() - (rt.totalMemory() - rt.freeMemory());
    }

    /**
     * Refuses a run that will not fit.
     *
     * @param concurrent how many such runs share the memory (sweep threads)
     * @param what what is being run, for the message ("scenario x.yaml", "sweep s.yaml member m0003")
     */
    public void check(int concurrent, String what) {
        long need = BASE_BYTES / 2 + (long) Math.max(1, concurrent) * runBytes();
        long available = availableBytes();
        if (need > available) {
            System.gc(); // garbage counts as used until collected
            available = availableBytes();
        }
        check(concurrent, what, available);
    }

    /** As {@link #check(int, String)} against a given number of available bytes (tests). */
    public void check(int concurrent, String what, long available) {
        long need = BASE_BYTES / 2 + (long) Math.max(1, concurrent) * runBytes();
        if (need <= available) {
            return;
        }
        String largest;
        if (modelBytes >= sectionBytes && modelBytes >= soundingBytes) {
            largest = scenario.kind() == Scenario.Kind.LINEAR
                    ? "the model (grid.points x grid.levels x physics.harmonics = " + scenario.xGrid().nx() + " x "
                    + scenario.zGrid().size() + " x " + scenario.physics().harmonics() + "); coarsen the grid or keep fewer harmonics"
                    : "the model (grid.points x grid.levels = " + scenario.xGrid().nx() + " x " + scenario.zGrid().size()
                    + ", snapshots every " + fmt(Math.min(Scenario.NONLINEAR_STORE_MAX_S / 60.0, scenario.output().stepMin()))
                    + " min); coarsen the grid or lengthen output.step_min";
        } else if (soundingBytes >= sectionBytes) {
            largest = "the soundings (" + profiles + " profiles of " + bins + " bins); lengthen flights.cadence_min, thicken "
                    + "flights.bin_m or lower flights.ceiling_m";
        } else {
            largest = "the output sections (" + outputTimes + " output times x " + scenario.xGrid().nx()
                    + " points); lengthen output.step_min or shorten output.start_h..end_h";
        }
        throw new UserInputException(String.format(Locale.ROOT, "%s: this run needs about %s of memory%s but %s is available; most "
                + "of it is %s (or give Java more memory: LITTORAL_JAVA_OPTS=-Xmx8g)", what, InputText.bytes(need),
                concurrent > 1 ? " (" + concurrent + " members at once)" : "", InputText.bytes(available), largest));
    }

    /** Parts of the estimate, MB, for benchmarks and reports. */
    public String describe() {
        return String.format(Locale.ROOT, "model %.0f MB, sections %.0f MB, soundings %.0f MB (%d profiles x %d bins)",
                modelBytes / 1048576.0, sectionBytes / 1048576.0, soundingBytes / 1048576.0, profiles, bins);
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : String.format(Locale.ROOT, "%.1f", v);
    }
}
