package org.oedometry.core;

/**
 * Whether an increment adds load or removes it, derived from its stresses (never typed in).
 *
 * <p>Unload and reload branches give the recompression index C<sub>r</sub>; loading beyond the
 * preconsolidation pressure gives the compression index C<sub>c</sub>.
 */
public enum LoadDirection {
  /** The stress after the increment is greater than the stress before it. */
  LOADING,
  /** The stress after the increment is less than the stress before it. */
  UNLOADING
}
