/**
 * Demo programs on invented data and the benchmarks: the only part of the project that prints. Not
 * public API.
 */
package org.oedometry.examples;
