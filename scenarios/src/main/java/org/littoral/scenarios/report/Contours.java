package org.littoral.scenarios.report;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Contour lines of a gridded field by marching squares (Lorensen and Cline 1987, in its 2D form),
 * with saddle cells resolved by the cell-centre mean, and segments chained into polylines so dashes
 * run continuously. Cells with a NaN corner produce no segment.
 */
final class Contours {
    private Contours() {
    }

    /** One contour polyline in data coordinates. */
    static final class Line {
        final double level;
        final double[] x;
        final double[] y;

        Line(double level, double[] x, double[] y) {
            this.level = level;
            this.x = x;
            this.y = y;
        }
    }

    /**
     * @param xs node x (length nx), ys node y (length ny), v values [ny][nx]
     */
    static List<Line> trace(double[] xs, double[] ys, double[][] v, double level) {
        int nx = xs.length;
        int ny = ys.length;
        Map<Long, double[]> point = new HashMap<>();
        List<long[]> segments = new ArrayList<>();
        for (int k = 0; k + 1 < ny; k++) {
            for (int i = 0; i + 1 < nx; i++) {
                double v00 = v[k][i];
                double v10 = v[k][i + 1];
                double v11 = v[k + 1][i + 1];
                double v01 = v[k + 1][i];
                if (Double.isNaN(v00) || Double.isNaN(v10) || Double.isNaN(v11) || Double.isNaN(v01)) {
                    continue;
                }
                int c = (v00 >= level ? 1 : 0) | (v10 >= level ? 2 : 0) | (v11 >= level ? 4 : 0)
                        | (v01 >= level ? 8 : 0);
                if (c == 0 || c == 15) {
                    continue;
                }
                long e0 = 2L * (k * (long) nx + i); // bottom: (i,k)-(i+1,k)
                long e1 = 2L * (k * (long) nx + i + 1) + 1; // right: (i+1,k)-(i+1,k+1)
                long e2 = 2L * ((k + 1) * (long) nx + i); // top: (i,k+1)-(i+1,k+1)
                long e3 = 2L * (k * (long) nx + i) + 1; // left: (i,k)-(i,k+1)
                put(point, e0, xs[i], ys[k], v00, xs[i + 1], ys[k], v10, level);
                put(point, e1, xs[i + 1], ys[k], v10, xs[i + 1], ys[k + 1], v11, level);
                put(point, e2, xs[i], ys[k + 1], v01, xs[i + 1], ys[k + 1], v11, level);
                put(point, e3, xs[i], ys[k], v00, xs[i], ys[k + 1], v01, level);
                if (c == 5 || c == 10) {
                    boolean centreAbove = 0.25 * (v00 + v10 + v11 + v01) >= level;
                    // c == 5: corners 00 and 11 above. Centre above joins them, isolating 10 and 01.
                    boolean isolateTenAndOhOne = (c == 5) == centreAbove;
                    if (isolateTenAndOhOne) {
                        segments.add(new long[] {e0, e1});
                        segments.add(new long[] {e2, e3});
                    } else {
                        segments.add(new long[] {e0, e3});
                        segments.add(new long[] {e1, e2});
                    }
                    continue;
                }
                long[] crossed = new long[2];
                int n = 0;
                if (((c & 1) != 0) != ((c & 2) != 0)) {
                    crossed[n++] = e0;
                }
                if (((c & 2) != 0) != ((c & 4) != 0)) {
                    crossed[n++] = e1;
                }
                if (((c & 8) != 0) != ((c & 4) != 0)) {
                    crossed[n++] = e2;
                }
                if (((c & 1) != 0) != ((c & 8) != 0)) {
                    crossed[n++] = e3;
                }
                if (n == 2) {
                    segments.add(crossed);
                }
            }
        }
        return chain(segments, point, level);
    }

    private static void put(Map<Long, double[]> point, long key, double xa, double ya, double va, double xb,
            double yb, double vb, double level) {
        if ((va >= level) == (vb >= level) || point.containsKey(key)) {
            return;
        }
        double t = (level - va) / (vb - va);
        point.put(key, new double[] {xa + t * (xb - xa), ya + t * (yb - ya)});
    }

    private static List<Line> chain(List<long[]> segments, Map<Long, double[]> point, double level) {
        Map<Long, List<Integer>> byEdge = new HashMap<>();
        for (int s = 0; s < segments.size(); s++) {
            for (long e : segments.get(s)) {
                byEdge.computeIfAbsent(e, key -> new ArrayList<>(2)).add(s);
            }
        }
        boolean[] used = new boolean[segments.size()];
        List<Line> lines = new ArrayList<>();
        for (int s0 = 0; s0 < segments.size(); s0++) {
            if (used[s0]) {
                continue;
            }
            used[s0] = true;
            java.util.ArrayDeque<Long> keys = new java.util.ArrayDeque<>();
            keys.add(segments.get(s0)[0]);
            keys.add(segments.get(s0)[1]);
            extend(keys, false, segments, byEdge, used);
            extend(keys, true, segments, byEdge, used);
            double[] x = new double[keys.size()];
            double[] y = new double[keys.size()];
            int j = 0;
            for (long key : keys) {
                double[] p = point.get(key);
                x[j] = p[0];
                y[j] = p[1];
                j++;
            }
            lines.add(new Line(level, x, y));
        }
        return lines;
    }

    private static void extend(java.util.ArrayDeque<Long> keys, boolean atFront, List<long[]> segments,
            Map<Long, List<Integer>> byEdge, boolean[] used) {
        while (true) {
            long end = atFront ? keys.peekFirst() : keys.peekLast();
            int next = -1;
            for (int s : byEdge.get(end)) {
                if (!used[s]) {
                    next = s;
                    break;
                }
            }
            if (next < 0) {
                return;
            }
            used[next] = true;
            long[] seg = segments.get(next);
            long other = seg[0] == end ? seg[1] : seg[0];
            if (atFront) {
                keys.addFirst(other);
            } else {
                keys.addLast(other);
            }
        }
    }
}
