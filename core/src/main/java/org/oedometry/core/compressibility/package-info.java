/**
 * Derivation of compressibility and permeability parameters from an oedometer test's compression
 * curve, given as plain numbers: void ratio and axial strain at each stress, per increment
 * a<sub>v</sub> and m<sub>v</sub>, compression and recompression indices, the preconsolidation
 * pressure by several published constructions, k and C<sub>k</sub> from c<sub>v</sub>, and
 * secondary compression indices.
 *
 * <p>Entry points: {@link org.oedometry.core.compressibility.CompressionCurve} (input, built from
 * numbers or from {@link org.oedometry.core.compressibility.SpecimenPhases} and each increment's
 * settlement), {@link org.oedometry.core.compressibility.Compressibility}, {@link
 * org.oedometry.core.compressibility.CompressionIndex}, {@link
 * org.oedometry.core.compressibility.CasagrandeMethod}, {@link
 * org.oedometry.core.compressibility.PachecoSilvaMethod}, {@link
 * org.oedometry.core.compressibility.BilinearVolumeMethod}, {@link
 * org.oedometry.core.compressibility.Permeability}, {@link
 * org.oedometry.core.compressibility.PermeabilityChangeIndex} and {@link
 * org.oedometry.core.compressibility.SecondaryCompression}.
 *
 * <p>Units are SI throughout: stresses in Pa, lengths in m, c<sub>v</sub> in m^2/s, m<sub>v</sub>
 * and a<sub>v</sub> in 1/Pa, k in m/s, unit weights in N/m^3. Plot coordinates use log<sub>10</sub>
 * of the stress in Pa. Where a quantity cannot be derived from valid input, the result says why
 * instead of throwing; invalid input throws {@link java.lang.IllegalArgumentException} with a
 * message naming the field, the index and the value.
 *
 * <p>Results feed engineering decisions: they must be reviewed by a qualified engineer, and local
 * codes and standards govern.
 */
package org.oedometry.core.compressibility;
