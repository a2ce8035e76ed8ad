/**
 * JMH benchmarks, each beside its baseline in the same run. Run with the {@code bench} profile (see
 * README, Performance). Not public API.
 */
package org.oedometry.examples.bench;
