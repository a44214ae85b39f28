/**
 * Surface physics as pure functions and small value types (no I/O): solar geometry, clear-sky and
 * cloudy global radiation, net radiation and the land surface energy balance, bulk fluxes over water
 * and land drag with stability, and the boundary-layer eddy-diffusivity profile.
 *
 * <p>Every formula names its source beside the code; constants that the project's reference list marks
 * as recalled rather than read in the source say "from memory". See {@code docs/physics-surface.md}.
 */
package org.littoral.model.surface;
