package org.littoral.model.nonlinear;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;

class PoissonSolverTest {

    /** The solve must satisfy its own discrete equations (residual at round-off) for a compatible right side. */
    @ParameterizedTest
    @CsvSource({"64, 17", "400, 33", "30, 4", "48, 3", "512, 97"})
    void residualOfTheDiscretePoissonEquationIsAtRoundOff(int nx, int nInterfaces) {
        StaggeredGrid g = new StaggeredGrid(HorizontalGrid.centred(nx, 1000.0), VerticalGrid.stretched(nInterfaces, 5000.0, 30.0));
        Random rnd = new Random(7);
        // the divergence of a random flow with w = 0 at ground and lid is compatible by construction
        double[] u = new double[g.nz * nx];
        double[] w = new double[(g.nz + 1) * nx];
        for (int n = 0; n < u.length; n++) {
            u[n] = rnd.nextGaussian();
        }
        for (int n = nx; n < g.nz * nx; n++) {
            w[n] = 0.01 * rnd.nextGaussian();
        }
        double[] d = new double[g.nz * nx];
        double maxD = 0;
        for (int k = 0; k < g.nz; k++) {
            for (int i = 0; i < nx; i++) {
                d[k * nx + i] = (u[k * nx + g.ip1[i]] - u[k * nx + i]) / g.dx + (w[(k + 1) * nx + i] - w[k * nx + i]) / g.dzf[k];
                maxD = Math.max(maxD, Math.abs(d[k * nx + i]));
            }
        }
        PoissonSolver ps = new PoissonSolver(g);
        double[] chi = new double[d.length];
        ps.solve(d, chi);
        double[] lap = ps.laplacian(chi);
        double maxR = 0;
        for (int n = 0; n < d.length; n++) {
            maxR = Math.max(maxR, Math.abs(lap[n] - d[n]));
        }
        assertTrue(maxR < 1e-10 * maxD, "relative residual " + maxR / maxD);
    }
}
