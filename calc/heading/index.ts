/**
 * Heading from an accelerometer: a whole-body spinner that steers while spinning estimates its spin
 * rate from the radial (centripetal) reading of an accelerometer, ω̂ = √((a − b̂)/r̂), and
 * integrates it to a heading. The topic's public surface, in two modules so that a page which needs
 * one part loads only that part:
 *
 * - calc/heading-drift.ts: how calibration errors (radius, scale, offset, tilt) become heading drift,
 *   exactly and term by term; the firmware radii and the speeds that keep it within a budget; two
 *   opposed sensors; the chapter's worked example.
 * - calc/heading-timing.ts: what the control loop's period, latency and a beacon's on-time cost in
 *   heading; what smoothing costs in lag and does to a spike.
 *
 * Sign convention throughout: drift = ω̂ − ω. Positive drift means the estimated heading runs ahead
 * of the true heading (the robot "thinks" it has turned further than it has).
 */
export * from "./drift.ts";
export * from "./timing.ts";
