/**
 * The tool's own qualification: NIST StRD certified values recomputed by the calibration fits on the
 * machine where meritbook runs ({@code meritbook qualify}). The NIST files ship unchanged as resources.
 */
package org.meritbook.qualification;
