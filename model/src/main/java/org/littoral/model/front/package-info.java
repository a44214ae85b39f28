/**
 * Front diagnostics: THE definitions of the breeze's onset at the coast, of its arrival (front passage) at a
 * site, of its maximum inland penetration and of the implied speed between sites, for every model and every
 * job (run summary, sweeps, planner truth, timing envelope, compare). Physics only: plain arrays in, records
 * out, no I/O. Entry point: {@link org.littoral.model.front.FrontTracker#track}; the definitions are written
 * out in docs/fronts.md and by {@link org.littoral.model.front.FrontCriteria#describe}.
 */
package org.littoral.model.front;
