/**
 * Adaptive Dormand–Prince 8(5,3) references for both models (Commons Math), with event detection
 * for domain exits, mirror points and sheet crossings, and the observers that receive their
 * dense output.
 */
package org.twinorbit.integrators.reference;
