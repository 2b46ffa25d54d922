/**
 * The relativistic guiding-center model: its equations of motion in (X in m, p∥ in kg m/s,
 * μ in J/T) and the fixed-step integrators that advance them.
 */
package org.twinorbit.integrators.guidingcenter;
