/**
 * Whole-test reduction of an oedometer test: {@link org.oedometry.fitting.reduction.TestReduction}
 * runs every c<sub>v</sub> method on every increment with the test's drainage path rule, derives
 * the compressibility and permeability parameters, and returns a {@link
 * org.oedometry.fitting.reduction.TestReport}, which renders as text, CSV, JSON and AGS4. Options:
 * {@link org.oedometry.fitting.reduction.ReductionOptions}.
 *
 * <p>Results feed engineering decisions: they must be reviewed by a qualified engineer, and local
 * codes and standards govern.
 */
package org.oedometry.fitting.reduction;
