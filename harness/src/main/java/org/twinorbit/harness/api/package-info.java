/**
 * The Java entry point for pusher authors: run a case with a pusher instance
 * ({@link org.twinorbit.harness.api.PusherTrial}) and assert on the result in a unit test
 * ({@link org.twinorbit.harness.api.PusherAssertions}). A new leapfrog scheme extends
 * {@link org.twinorbit.integrators.fullorbit.LeapfrogPusher}; examples/java-pusher is a complete
 * project that does both.
 */
package org.twinorbit.harness.api;
