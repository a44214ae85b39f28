package org.littoral.model.linear;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.littoral.model.nonlinear.ThetaProfile;

/**
 * The vertical column of the linear model when N varies with height: the nodes of the {@link StratifiedVerticalSolver}
 * (the ground, every layer interface and output level below the top of the varying part, refined to at most
 * {@link #MAX_SPACING_M}), each cell's mean N^2, the heating profile at the nodes for every harmonic, and the
 * continuation above the top z_T, where N is constant: Psi = Psi_T exp(-m s) + F_T (exp(-a s) - exp(-m s)) / (a^2 - m^2),
 * s = z - z_T (the last term only for the exponential heating of the classic shape). Not thread-safe.
 */
final class StratifiedColumn {
    /** Largest node spacing, m: N^2 and the heating are resolved at least this finely. */
    static final double MAX_SPACING_M = 25.0;
    /** Nodes per afternoon mixed-layer depth for the slab heating, as for the constant-N slab solve. */
    private static final int SLAB_NODES_PER_DEPTH = 96;

    private final double[] zOut;
    private final int[] outNode;
    private final double topM;
    private final double topN2;
    private final double tailDecayPerM;
    private final double[][] nodeFr;
    private final double[][] nodeFi;
    private final double[] topFr;
    private final double[] topFi;
    private final StratifiedVerticalSolver solver;
    private final double[] pr, pi, pzr, pzi;
    private final double[] ex = new double[4];

    StratifiedColumn(ThetaProfile profile, double[] zOut, HeatingHarmonics heat) {
        this.zOut = zOut.clone();
        double maxDz = MAX_SPACING_M;
        if (heat.exponential()) {
            maxDz = Math.min(maxDz, 1.0 / (40 * heat.decayPerM()));
        } else {
            maxDz = Math.min(maxDz, heat.sourceTopM() / SLAB_NODES_PER_DEPTH);
        }
        double top = Math.max(profile.constantAboveM(), 4 * maxDz);
        if (!heat.exponential()) {
            // the slab source is zero above its top: z_T at or above it keeps the continuation source-free
            top = Math.max(top, heat.sourceTopM());
        }
        topM = top;
        TreeSet<Double> fixed = new TreeSet<>();
        fixed.add(0.0);
        fixed.add(top);
        for (double z : profile.interfacesM()) {
            if (z > 0 && z < top) {
                fixed.add(z);
            }
        }
        for (double z : zOut) {
            if (z > 0 && z < top) {
                fixed.add(z);
            }
        }
        List<Double> nodes = new ArrayList<>();
        Double prev = null;
        for (double z : fixed) {
            if (prev != null) {
                int parts = Math.max(1, (int) Math.ceil((z - prev) / maxDz - 1e-9));
                for (int s = 1; s < parts; s++) {
                    nodes.add(prev + (z - prev) * s / parts);
                }
            }
            nodes.add(z);
            prev = z;
        }
        double[] zn = nodes.stream().mapToDouble(Double::doubleValue).toArray();
        double[] cellN2 = new double[zn.length - 1];
        for (int j = 0; j < cellN2.length; j++) {
            cellN2[j] = profile.meanBuoyancyFrequencySquared(zn[j], zn[j + 1]);
        }
        topN2 = profile.buoyancyFrequencySquared(top + 1.0);
        outNode = new int[zOut.length];
        for (int l = 0; l < zOut.length; l++) {
            outNode[l] = zOut[l] <= top ? java.util.Arrays.binarySearch(zn, Math.max(0.0, zOut[l])) : -1;
            if (zOut[l] <= top && outNode[l] < 0) {
                throw new IllegalStateException("output level " + zOut[l] + " m is not a node (a bug)");
            }
        }
        tailDecayPerM = heat.exponential() ? heat.decayPerM() : Double.NaN;
        int nh = heat.count();
        nodeFr = new double[nh][zn.length];
        nodeFi = new double[nh][zn.length];
        topFr = new double[nh];
        topFi = new double[nh];
        double[] q = new double[2];
        for (int h = 0; h < nh; h++) {
            for (int j = 0; j < zn.length; j++) {
                heat.profile(h, zn[j], q);
                nodeFr[h][j] = q[0];
                nodeFi[h][j] = q[1];
            }
            topFr[h] = nodeFr[h][zn.length - 1];
            topFi[h] = nodeFi[h][zn.length - 1];
        }
        solver = new StratifiedVerticalSolver(zn, cellN2);
        pr = new double[zn.length];
        pi = new double[zn.length];
        pzr = new double[zn.length];
        pzi = new double[zn.length];
    }

    /** N^2 above the varying part, 1/s^2 (sets the root m_top the caller chooses). */
    double topBuoyancyFrequencySquared() {
        return topN2;
    }

    int nodeCount() {
        return solver.size();
    }

    /**
     * Solves harmonic h for m(z)^2 = A N(z)^2 + B and writes Psi and Psi_z per unit source amplitude at the output
     * levels into {@code out*[offset + l]}.
     */
    void solve(int h, double aR, double aI, double bR, double bI, double mTopR, double mTopI,
               double[] outPR, double[] outPI, double[] outUR, double[] outUI, int offset) {
        if (!solver.solve(aR, aI, bR, bI, mTopR, mTopI, nodeFr[h], nodeFi[h], tailDecayPerM, pr, pi, pzr, pzi)) {
            throw new IllegalArgumentException("the stratified column is resonant for a mode without damping; set frictionPerS > 0");
        }
        int top = pr.length - 1;
        for (int l = 0; l < zOut.length; l++) {
            int j = outNode[l];
            if (j >= 0) {
                outPR[offset + l] = pr[j];
                outPI[offset + l] = pi[j];
                outUR[offset + l] = pzr[j];
                outUI[offset + l] = pzi[j];
                continue;
            }
            // continuation above z_T: Psi_T exp(-m s) (+ the exponential tail)
            double s = zOut[l] - topM;
            double mag = Math.exp(-mTopR * s);
            double er = mag * Math.cos(mTopI * s);
            double ei = -mag * Math.sin(mTopI * s);
            double psR = pr[top] * er - pi[top] * ei;
            double psI = pr[top] * ei + pi[top] * er;
            double uR = -(mTopR * psR - mTopI * psI);
            double uI = -(mTopR * psI + mTopI * psR);
            if (tailDecayPerM > 0) {
                VerticalGreenSolver.exponentialSource(tailDecayPerM, mTopR, mTopI, s, ex);
                psR += topFr[h] * ex[0] - topFi[h] * ex[1];
                psI += topFr[h] * ex[1] + topFi[h] * ex[0];
                uR += topFr[h] * ex[2] - topFi[h] * ex[3];
                uI += topFr[h] * ex[3] + topFi[h] * ex[2];
            }
            outPR[offset + l] = psR;
            outPI[offset + l] = psI;
            outUR[offset + l] = uR;
            outUI[offset + l] = uI;
        }
    }
}
