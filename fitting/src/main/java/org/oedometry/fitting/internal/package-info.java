/**
 * Numerical helpers of the constructions: argument checks, the monotone cubic interpolant, local
 * least-squares lines and the preparation of one increment's readings. Not exported; not API.
 */
package org.oedometry.fitting.internal;
