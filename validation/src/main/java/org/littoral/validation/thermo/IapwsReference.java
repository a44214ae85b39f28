package org.littoral.validation.thermo;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;

/**
 * Saturation vapour pressure over liquid water from the IAPWS-IF97 region-4 equation, computed live by
 * Debian's python3-iapws ({@code iapws.iapws97._PSat_T(T)}, T in K, result in MPa). Used only by the
 * validation suite, never by the model.
 */
final class IapwsReference {
    /** Interpreters tried in order: Debian's system python first (where apt installs python3-iapws). */
    private static final String[] PYTHONS = {"/usr/bin/python3", "python3"};

    private IapwsReference() {
    }

    /** Result of one call: pressures in Pa, or the reason none could be computed. */
    record Result(double[] pressuresPa, String failure) {
        boolean ok() {
            return failure == null;
        }
    }

    /** p_s(T) in Pa for each temperature (K), from one python process. */
    static Result saturationPressuresPa(double... temperaturesK) {
        StringBuilder list = new StringBuilder();
        for (double t : temperaturesK) {
            list.append(list.length() == 0 ? "" : ",").append(String.format(Locale.ROOT, "%.6f", t));
        }
        String script = "from iapws.iapws97 import _PSat_T\n"
                + "for T in [" + list + "]:\n"
                + "    print(repr(_PSat_T(T) * 1e6))\n";
        List<String> failures = new ArrayList<>();
        for (String python : PYTHONS) {
            try {
                Process p = new ProcessBuilder(python, "-c", script).redirectErrorStream(true).start();
                byte[] out;
                try (InputStream in = p.getInputStream()) {
                    out = in.readAllBytes();
                }
                if (!p.waitFor(30, TimeUnit.SECONDS)) {
                    p.destroyForcibly();
                    failures.add(python + " timed out");
                    continue;
                }
                String text = new String(out, StandardCharsets.UTF_8).trim();
                if (p.exitValue() != 0) {
                    String last = text.isEmpty() ? "" : text.substring(text.lastIndexOf('\n') + 1);
                    failures.add(python + " exited " + p.exitValue() + (last.isEmpty() ? "" : ": " + last));
                    continue;
                }
                String[] lines = text.split("\\R");
                if (lines.length != temperaturesK.length) {
                    failures.add(python + " printed " + lines.length + " lines for " + temperaturesK.length + " temperatures");
                    continue;
                }
                double[] pa = new double[lines.length];
                for (int i = 0; i < lines.length; i++) {
                    pa[i] = Double.parseDouble(lines[i].trim());
                }
                return new Result(pa, null);
            } catch (IOException e) {
                failures.add(python + " not runnable (" + e.getMessage() + ")");
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                failures.add(python + " interrupted");
                break;
            } catch (NumberFormatException e) {
                failures.add(python + " printed a non-number (" + e.getMessage() + ")");
            }
        }
        return new Result(null, "IAPWS reference unavailable: " + String.join("; ", failures)
                + ". Install it with: apt-get install -y python3-iapws (.ci/run does this)");
    }
}
