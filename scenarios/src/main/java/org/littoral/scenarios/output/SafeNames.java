package org.littoral.scenarios.output;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * Names from the user's files (scenario, site, sweep) made into parts of file names: letters, digits, '.', '_'
 * and '-' only (no path separators, so {@code name: ../../x} stays inside the output folder), no leading dot, at
 * most {@link #MAX} characters. A name that had to be changed gets a short hash of the original, so two different
 * names never share a file.
 */
public final class SafeNames {
    /** Longest file-name part (file systems allow 255 bytes for a whole name). */
    public static final int MAX = 80;

    private SafeNames() {
    }

    public static String fileName(String name) {
        if (name == null || name.isEmpty()) {
            return "unnamed";
        }
        String s = name.replaceAll("[^A-Za-z0-9._-]", "_").replaceAll("_+", "_").replaceAll("^[._-]+", "");
        if (s.equals(name) && s.length() <= MAX) {
            return s;
        }
        String hash = hash(name);
        int keep = Math.min(s.length(), MAX - hash.length() - 1);
        String head = s.substring(0, keep).replaceAll("[._-]+$", "");
        return (head.isEmpty() ? "name" : head) + "-" + hash;
    }

    private static String hash(String s) {
        try {
            byte[] d = MessageDigest.getInstance("SHA-256").digest(s.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(d, 0, 4);
        } catch (NoSuchAlgorithmException e) {
            return Integer.toHexString(s.hashCode());
        }
    }
}
