/**
 * Per-increment c<sub>v</sub> methods and the whole-test reduction. Results feed engineering
 * decisions: they must be reviewed by a qualified engineer, and local codes and standards govern.
 */
package org.oedometry.fitting;
