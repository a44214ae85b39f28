package org.littoral.model.nonlinear;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleSupplier;

/**
 * The 2D (x, z) non-hydrostatic Boussinesq breeze model on an f-plane. Prognostic u (cross-shore), v
 * (alongshore), w, theta and water-vapour mixing ratio r on an Arakawa C-grid, x periodic, rigid lid.
 *
 * <pre>
 *   du/dt = -adv(u) - d(phi)/dx + f (v - Vg) - alpha (u - Ug) + mixing + drag
 *   dv/dt = -adv(v)             - f (u - Ug) - alpha (v - Vg) + mixing + drag
 *   dw/dt = -adv(w) - d(phi)/dz + b           - alpha w
 *   d(theta)/dt = -adv(theta) + Q - alpha_N (theta - theta_0) + mixing (surface heat flux)
 *   dr/dt       = -adv(r)         - alpha_N (r - r_0)         + mixing (surface moisture flux)
 *   du/dx + dw/dz = 0,    b = g [(theta - theta_0) / theta_0 + 0.608 (r - r_0)]
 * </pre>
 *
 * <p>This class only wires the parts, each a file of its own: the {@link BaseState} and the {@link ModelState};
 * the explicit terms ({@link MomentumAdvection} or, with the nonlinear terms switched off,
 * {@link LinearisedAdvection} and {@link BasicStateAdvection}; {@link LimitedScalarTransport} or
 * {@link FluxCorrectedScalarTransport}; {@link CoriolisAndFriction}; {@link NewtonianCooling};
 * {@link Buoyancy}; {@link PrescribedHeatingTerm}) stepped by {@link SspRungeKutta3} with the
 * {@link PressureProjection} after each stage; and, once per step before the explicit stages (first-order
 * splitting), the implicit column physics: {@link FarFieldColumn}s, {@link SurfaceLayer} fluxes
 * ({@link SurfaceFluxScheme}), {@link MixedLayerDepth}, {@link VerticalMixing} ({@link Tridiagonal}) and
 * {@link Sponges}. {@link Simulation} runs the time loop. Each choice of the configuration (linear mode,
 * scalar scheme, forcing kind, mixing) picks a part once here, never an {@code if} in a loop.
 *
 * <p>Physics only: no I/O. Use {@link #run(NonlinearConfig)}.
 */
public final class NonlinearModel {
    final NonlinearConfig cfg;
    final StaggeredGrid g;
    final BaseState base;
    final ModelState st;
    final PressureProjection projection;
    final SurfaceLayer surface;
    final MixedLayerDepth mixedLayer;
    final boolean fluxCorrected;
    /** The largest advective Courant rate, 1/s: of the flow, or of the ambient wind alone in linear mode. */
    final DoubleSupplier advectiveRate;
    private final VerticalMixing mixing;
    private final Sponges sponges;
    private final FarFieldColumn farLeft;
    private final FarFieldColumn farRight;
    private final SspRungeKutta3 rk3;
    /** The column physics of one step after the surface fluxes: mixing with the slab depth, or fluxes into layer 0. */
    private final ColumnStep columnStep;

    private interface ColumnStep {
        void step(double dt);
    }

    private NonlinearModel(NonlinearConfig cfg) {
        this.cfg = cfg;
        this.g = new StaggeredGrid(cfg.xGrid(), cfg.zInterfaces());
        this.base = new BaseState(cfg, g);
        this.st = new ModelState(g.nx, g.nz);
        this.projection = new PressureProjection(g, st);
        boolean linear = !cfg.switches().nonlinearTerms();
        NonlinearConfig.Damping d = cfg.damping();

        List<ExplicitTerm> terms = new ArrayList<>();
        if (linear) {
            terms.add(new LinearisedAdvection(g, st, base.ug));
            fluxCorrected = false;
            double rate = Math.abs(base.ug) / g.dx;
            advectiveRate = () -> rate;
        } else {
            terms.add(new MomentumAdvection(g, st));
            fluxCorrected = cfg.numerics().scalarTransport() == NonlinearConfig.ScalarTransport.FCT_STEP;
            terms.add(fluxCorrected ? new FluxCorrectedScalarTransport(g, st) : new LimitedScalarTransport(g, st));
            advectiveRate = () -> Simulation.flowCourantRate(g, st);
        }
        terms.add(new CoriolisAndFriction(g, st, base, d.rayleighFrictionPerS()));
        if (d.newtonianCoolingPerS() != 0.0) {
            terms.add(new NewtonianCooling(g, st, base, d.newtonianCoolingPerS()));
        }
        if (linear) {
            terms.add(new BasicStateAdvection(g, st, base));
        }
        terms.add(new Buoyancy(g, st, base, d.rayleighFrictionPerS(), cfg.switches().moistureBuoyancy()));
        if (cfg.forcing() instanceof Forcing.PrescribedHeating ph) {
            terms.add(new PrescribedHeatingTerm(g, st, ph.heating()));
        }
        this.rk3 = new SspRungeKutta3(st, terms.toArray(new ExplicitTerm[0]), projection);

        SurfaceFluxScheme scheme = SurfaceFluxScheme.of(cfg, g, base);
        this.surface = new SurfaceLayer(g, st, scheme);
        this.mixedLayer = new MixedLayerDepth(cfg, g, st);
        this.mixing = new VerticalMixing(cfg, g, st, base);
        this.sponges = new Sponges(d, g, st, base);
        if (sponges.lateral()) {
            farLeft = new FarFieldColumn(sponges.iLeftC, cfg, g, base, scheme, mixedLayer, mixing, sponges);
            farRight = new FarFieldColumn(sponges.iRightC, cfg, g, base, scheme, mixedLayer, mixing, sponges);
            sponges.relaxTowards(farLeft, farRight);
        } else {
            farLeft = null;
            farRight = null;
        }
        if (cfg.switches().mixing()) {
            columnStep = dt -> {
                mixedLayer.step(surface.heatFluxKin, dt);
                mixing.mixDomain(surface, mixedLayer.h, dt);
            };
        } else {
            columnStep = surface::fluxIntoLowestLayer;
        }
    }

    /**
     * Runs the model from start to end and returns the stored snapshots.
     *
     * @throws ModelBlowUpException when the run goes unstable (carries the partial solution)
     */
    public static NonlinearSolution run(NonlinearConfig config) {
        return new Simulation(new NonlinearModel(config)).run();
    }

    /** For tests: a model ready to integrate, whose final discrete divergence can be inspected. */
    static NonlinearModel create(NonlinearConfig config) {
        return new NonlinearModel(config);
    }

    /** For tests: integrates this model (see {@link #run}). */
    NonlinearSolution integrate() {
        return new Simulation(this).run();
    }

    /** Largest |du/dx + dw/dz| * dx / (typical |u|) of the current state: relative discrete divergence (tests). */
    double maxRelativeDivergence() {
        return projection.maxRelativeDivergence(base.ug);
    }

    /** The start state, non-divergent; no pressure yet. */
    void initialise() {
        InitialState.fill(cfg, g, base, st, surface.scheme(), mixing, mixedLayer.h, sponges.rTopC, farLeft, farRight);
        projection.project(1.0);
        projection.clearPressure();
    }

    /** One step from t to t + dt: the implicit column physics, a projection, then the explicit stages. */
    void step(double t, double dt) {
        if (farLeft != null) {
            farLeft.step(t, dt);
            farRight.step(t, dt);
        }
        surface.update(t);
        columnStep.step(dt);
        sponges.apply(dt);
        // mixing, drag and sponges change u and w column by column: remove the divergence they leave
        // before flux-form advection sees it (a divergent flow would act as a spurious source of theta)
        projection.project(dt);
        rk3.step(t, dt);
    }
}
