/**
 * Terzaghi's one-dimensional consolidation theory: the average degree of consolidation U(T) and its
 * inverse, dU/dT, the excess pore pressure u/u<sub>0</sub>(Z, T), drainage, and the field
 * time-settlement forecast of a clay layer.
 *
 * <p>Every {@code double} is SI (seconds, metres, pascals, m<sup>2</sup>/s) or dimensionless.
 * Results feed engineering decisions: they must be reviewed by a qualified engineer, and local
 * codes and standards govern.
 */
package org.oedometry.theory;
