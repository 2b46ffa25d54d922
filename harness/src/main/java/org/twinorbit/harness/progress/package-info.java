/** Progress bars on stderr and the time-left estimate behind them. */
package org.twinorbit.harness.progress;
