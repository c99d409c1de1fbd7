/** Timing harnesses run by bench/timing.sh; they print figures and are not tests. */
package org.meritbook.bench;
