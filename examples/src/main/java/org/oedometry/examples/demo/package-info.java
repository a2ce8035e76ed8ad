/**
 * The demo oedometer test: <b>invented, for demonstration</b>, generated with the library's own
 * forward model and written with its CSV writer; the three files lie beside this package on the
 * class path. Not public API, and not data from any real site.
 */
package org.oedometry.examples.demo;
