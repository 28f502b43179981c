/**
 * What a run or a sweep shows a person: {@link org.trundle.report.RunRecorder} records a run's
 * samples and events (and streams {@code trajectory.csv}), {@link org.trundle.report.RunPlot} draws
 * {@code run.png} from them, and {@link org.trundle.report.RegimeMap} draws a sweep's regime map.
 * Quantities are in SI units and labelled with them.
 */
package org.trundle.report;
