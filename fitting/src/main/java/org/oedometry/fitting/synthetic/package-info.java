/**
 * Seeded generators of synthetic increments (Terzaghi primary consolidation, optional secondary
 * compression, reading schedules, noise and rounding) for testing c<sub>v</sub> methods. Plain Java
 * with explicit seeds, so that any property-testing tool can drive them; the same arguments always
 * give the same readings. The curves are invented test data, not measurements.
 */
package org.oedometry.fitting.synthetic;
