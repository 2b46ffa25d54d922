/**
 * Maps between the two models: placing a particle on a guiding center's gyro-ring and reading
 * a particle's guiding center back, to zeroth or first order in ε = ρ/L.
 */
package org.twinorbit.integrators.maps;
