package org.littoral.scenarios.scenario;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Locale;
import org.littoral.scenarios.input.UserInputException;

/**
 * Which model a job runs when it needs a front time (plan, check-timing, compare): linear theory has no front
 * (docs/fronts.md), so the default is the nonlinear model, on a cross-shore grid coarse enough for ensembles of
 * tens of members on two cores. The linear model stays available as a quick look; its times are the onset of
 * onshore flow, and every job says so.
 */
public final class JobModel {
    private JobModel() {
    }

    /** How the times of a linear run are labelled wherever a reader sees them. */
    public static final String LINEAR_TIMES = "onset of onshore flow (linear theory has no front)";
    /** How the times of a nonlinear run are labelled. */
    public static final String NONLINEAR_TIMES = "front arrival";

    /** The planning grid of nonlinear ensembles: 200 x 2 km (400 km, 50 km sponges each side), as the hypotheses sweep. */
    public static final int ENSEMBLE_POINTS = 200;
    public static final double ENSEMBLE_SPACING_KM = 2.0;
    /** Layer interfaces from the ground to the lid; the lowest layer as the scenario gives it, else this. */
    public static final int ENSEMBLE_LEVELS = 32;
    public static final double ENSEMBLE_FIRST_LEVEL_M = 20.0;

    /** The models a job accepts on its command line. */
    public static final List<String> CHOICES = List.of("nonlinear", "linear");

    /** The label of a model's times: {@link #NONLINEAR_TIMES} or {@link #LINEAR_TIMES}. */
    public static String timesLabel(boolean fronts) {
        return fronts ? NONLINEAR_TIMES : LINEAR_TIMES;
    }

    /** As {@link #timesLabel(boolean)} from a model name ("linear", "linear spectral", "nonlinear ..."). */
    public static String timesLabel(String modelName) {
        return timesLabel(!isLinear(modelName));
    }

    /** True for the linear model's names ("linear", "linear spectral ..."), false for the nonlinear model's. */
    public static boolean isLinear(String modelName) {
        return modelName != null && modelName.toLowerCase(Locale.ROOT).startsWith("linear");
    }

    /**
     * Checks a {@code --model} value.
     *
     * @param option the option as the user wrote it, for the message
     */
    public static String check(String option, String value) {
        if (!CHOICES.contains(value)) {
            throw new UserInputException(option + " " + value + " is not one of " + CHOICES + " (nonlinear: fronts, the default; "
                    + "linear: a quick look whose times are the " + LINEAR_TIMES + ")");
        }
        return value;
    }

    /**
     * Makes a scenario document run the nonlinear model. A document that is linear has its grid replaced by the
     * ensemble grid unless {@code keepGrid} (the caller's file set the grid for this job); the lid height and the
     * lowest layer stay as the document gives them. A document that is already nonlinear is left as it is.
     *
     * @return true when the grid was replaced
     */
    public static boolean toNonlinear(ObjectNode doc, boolean keepGrid) {
        boolean wasLinear = !"nonlinear".equals(doc.path("kind").asText("linear"));
        doc.put("kind", "nonlinear");
        if (!wasLinear || keepGrid) {
            return false;
        }
        ObjectNode g = doc.with("grid");
        g.put("points", ENSEMBLE_POINTS);
        g.put("spacing_km", ENSEMBLE_SPACING_KM);
        g.put("levels", ENSEMBLE_LEVELS);
        if (!g.has("first_level_spacing_m")) {
            g.put("first_level_spacing_m", ENSEMBLE_FIRST_LEVEL_M);
        }
        return true;
    }

    /** One line for logs and reports: the ensemble grid put in place of a linear scenario's. */
    public static String gridNote(String what) {
        return String.format(Locale.ROOT, "%s runs the nonlinear model on the ensemble grid (%d x %.0f km, %d levels): linear "
                + "theory has no front", what, ENSEMBLE_POINTS, ENSEMBLE_SPACING_KM, ENSEMBLE_LEVELS);
    }
}
