/**
 * Gate-drive physics: the calculations every gatefit check and ranking rests on.
 *
 * <p>Pure functions on SI doubles (V, A, C, s, Ω, F, H, W, Hz), with no I/O and no catalog
 * types. Each function states its formula, assumptions and source. Invalid input throws
 * {@link java.lang.IllegalArgumentException} with an "expected …, got …" message; where a
 * catalog value may be missing, NaN means "not given" and the function returns an empty
 * {@code Optional}/{@code OptionalDouble} (documented per method) instead of a number.
 *
 * <ul>
 *   <li>{@link org.gatefit.physics.DriveCurrent}: Q_g/t, peak source and sink current, output
 *       resistance estimate.</li>
 *   <li>{@link org.gatefit.physics.GateCharge}: gate charge at the actual drive swing.</li>
 *   <li>{@link org.gatefit.physics.SwitchingTimes} and {@link org.gatefit.physics.GateWaveform}:
 *       delays, Miller plateau, V_GS(t) and I_G(t).</li>
 *   <li>{@link org.gatefit.physics.GateLoop} and {@link org.gatefit.physics.ESeries}: series RLC
 *       damping and ringing, gate-resistor range, IEC 60063 rounding.</li>
 *   <li>{@link org.gatefit.physics.GatePower} and {@link org.gatefit.physics.Bootstrap}: driver
 *       power split, bootstrap capacitor, duty and diode.</li>
 *   <li>{@link org.gatefit.physics.LogicFamily} and {@link org.gatefit.physics.NoiseMargins}:
 *       JEDEC logic levels and noise margins.</li>
 *   <li>{@link org.gatefit.physics.DvDt}, {@link org.gatefit.physics.SwitchingLoss},
 *       {@link org.gatefit.physics.DeadTime}, {@link org.gatefit.physics.TypicalGate}.</li>
 * </ul>
 *
 * <p>Sources:
 * <ul>
 *   <li>N. Mohan, T. Undeland, W. Robbins, <i>Power Electronics: Converters, Applications and
 *       Design</i>, 3rd ed., Wiley (switching losses, ch. 2; gate and base drive circuits).</li>
 *   <li>R. Erickson, D. Maksimović, <i>Fundamentals of Power Electronics</i>, 3rd ed., Springer
 *       (switching loss).</li>
 *   <li>JEDEC JESD8C.01 (3.3 V LVTTL/LVCMOS), JESD8-5 (2.5 V), JESD8-7 (1.8 V) interface
 *       levels; JESD24-2 (gate-charge test method).</li>
 *   <li>IEC 60063 (E-series preferred numbers); IEC 60747-8 / 60747-9 (FET / IGBT
 *       characteristics).</li>
 *   <li>Plain circuit theory (RC charging, series RLC step response, Q·V energy).</li>
 *   <li>Common practice, marked as such where used (bootstrap factor, typical gate window,
 *       dead-time budget).</li>
 * </ul>
 * Results are estimates from datasheet figures: verify on the bench and against the part's
 * datasheet.
 */
package org.gatefit.physics;
