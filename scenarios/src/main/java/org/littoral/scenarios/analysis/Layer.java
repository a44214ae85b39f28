package org.littoral.scenarios.analysis;

import java.util.Locale;
import org.littoral.scenarios.input.UserInputException;

/** A height layer above ground, bottom and top inclusive, m. */
public record Layer(double bottomM, double topM) {

    public Layer {
        if (!(topM > bottomM)) {
            throw new UserInputException("layer " + bottomM + "-" + topM + " m: top must be above bottom; write e.g. 100-300");
        }
    }

    public boolean contains(double heightM) {
        return heightM >= bottomM && heightM <= topM;
    }

    /** "100-300m". */
    public String label() {
        return String.format(Locale.ROOT, "%s-%sm", num(bottomM), num(topM));
    }

    /** Parses "100-300" (m). */
    public static Layer parse(String text) {
        String[] p = text.trim().replace("m", "").split("-");
        if (p.length != 2) {
            throw new UserInputException("layer " + org.littoral.scenarios.input.Shown.text(text) + " is not a layer; write it bottom-top in metres, e.g. 100-300");
        }
        try {
            return new Layer(Double.parseDouble(p[0].trim()), Double.parseDouble(p[1].trim()));
        } catch (NumberFormatException e) {
            throw new UserInputException("layer " + org.littoral.scenarios.input.Shown.text(text) + " is not a layer; write it bottom-top in metres, e.g. 100-300");
        }
    }

    private static String num(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }

    @Override
    public String toString() {
        return label();
    }
}
