/** Internal CSV helpers of the io package; not API, may change without notice. */
package org.oedometry.core.io.internal;
