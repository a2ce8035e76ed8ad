/** Internal helpers of the core module; not API, may change without notice. */
package org.oedometry.core.internal;
