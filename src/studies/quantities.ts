/**
 * The study vocabulary: every quantity a study can hold, with its kind and what it means. A
 * calculator binds its inputs and published outputs to these names in its `study` block; a name
 * means one physical thing in one kind (test/studies/quantities.test.ts checks every binding).
 * Limits are quantities too: a study lists them under `limits`, and verdicts compare against them.
 */
import type { QuantityKind } from '../core/units/index.ts';

export type StudyKind = QuantityKind | 'choice';

export interface StudyQuantity {
  readonly name: string;
  readonly kind: StudyKind;
  /** 'limit': given under `limits` in a study file; 'value': under `quantities` (or published by a step). */
  readonly role: 'value' | 'limit';
  readonly help: string;
}

const q = (name: string, kind: StudyKind, help: string, role: 'value' | 'limit' = 'value'): StudyQuantity => ({ name, kind, role, help });

export const STUDY_QUANTITIES: readonly StudyQuantity[] = [
  // duty
  q('meanPower', 'power', 'Mean power the damper turns into heat over the duty (the heat its body must shed).'),
  q('vehicleSpeed', 'velocity', 'Forward speed of the vehicle; in still air also the air speed past the vehicle (wind speed for a fixed body).'),
  q('sprungMass', 'mass', 'Body mass carried by the corner of the damper.'),
  q('unsprungMass', 'mass', 'Wheel, tyre, hub and the unsprung part of the links at the corner.'),
  q('springRate', 'stiffness', 'Suspension spring rate at the wheel.'),
  q('tyreRate', 'stiffness', 'Radial (vertical) stiffness of the tyre.'),
  q('strokeAmplitude', 'length', 'Amplitude (half of peak-to-peak) of a harmonic damper stroke.'),
  q('strokeFrequency', 'frequency', 'Frequency of a harmonic damper stroke.'),
  q('movingMass', 'mass', 'Mass that moves onto an end stop, payload included.'),
  q('impactSpeed', 'velocity', 'Speed at which the moving mass meets the end stop.'),
  q('stopStroke', 'length', 'Working stroke of the end-stop damper.'),
  q('propertyFactorMax', 'dimensionless', 'Maximum property modification factor λ_max of the damper: upper-bound properties = λ_max × nominal.'),
  q('propertyFactorMin', 'dimensionless', 'Minimum property modification factor λ_min of the damper: lower-bound properties = λ_min × nominal.'),
  // damper law
  q('damperLaw', 'choice', 'How the damper force depends on its velocity (linear, power, …).'),
  q('dampingCoefficient', 'damping', 'Linear damping coefficient of the damper, at the reference (dyno) temperature.'),
  q('powerLawForce', 'force', 'Power-law damper: force at the reference velocity, F_ref = C·v_ref^α.'),
  q('powerLawVelocity', 'velocity', 'Power-law damper: velocity at which F_ref is quoted.'),
  q('powerLawExponent', 'dimensionless', 'Power-law damper: velocity exponent α.'),
  q('frictionForce', 'force', 'Friction damper: slip force F_f.'),
  q('reboundLowSlope', 'damping', 'Bilinear damper: rebound (extension) slope below the knee velocity.'),
  q('reboundHighSlope', 'damping', 'Bilinear damper: rebound slope above the knee velocity.'),
  q('compressionLowSlope', 'damping', 'Bilinear damper: compression (bump) slope below the knee velocity.'),
  q('compressionHighSlope', 'damping', 'Bilinear damper: compression slope above the knee velocity.'),
  q('kneeVelocity', 'velocity', 'Bilinear damper: stroke velocity where the slope changes.'),
  q('lossFactor', 'dimensionless', 'Hysteretic damper: loss factor η.'),
  q('lossStiffness', 'stiffness', 'Hysteretic damper: stiffness k_h the loss factor acts on.'),
  q('seriesStiffness', 'stiffness', 'Spring in series with the damper (brace, mounts, oil column): Maxwell model; absent = rigid.'),
  // oil
  q('oilViscosity40', 'kinematicViscosity', 'Kinematic viscosity of the damper oil at 40 °C.'),
  q('oilViscosity100', 'kinematicViscosity', 'Kinematic viscosity of the damper oil at 100 °C.'),
  q('damperFluid', 'choice', 'How the damper fluid is described: mineral oil by ν40/ν100, by ISO VG grade, silicone fluid, or a measured table.'),
  q('oilExpansion', 'perTemperature', 'Volumetric thermal expansion coefficient β of the damper fluid.'),
  // temperature law of the damper
  q('referenceTemperature', 'temperature', 'Oil temperature at which the damping coefficient (dampingCoefficient) holds.'),
  q('fadeLaw', 'choice', 'Temperature law of the damping coefficient: share law or physical (density) law.'),
  q('fadeShare', 'dimensionless', 'Viscous (laminar, bleed) share of the damping coefficient at the reference temperature; fitted by fade-fit.'),
  // body and air
  q('bodyDiameter', 'length', 'Outside diameter of the damper body exposed to air.'),
  q('bodyLength', 'length', 'Length of the damper body wetted by oil and exposed to air.'),
  q('bodyOrientation', 'choice', 'Axis of the damper body: horizontal or vertical.'),
  q('bodyEmissivity', 'dimensionless', 'Emissivity of the body surface.'),
  q('localFlowFactor', 'dimensionless', 'Share of the air speed that actually crosses the body (wheel-arch shielding).'),
  q('airTemperature', 'temperature', 'Air temperature away from the body (also the start temperature).'),
  q('surroundingsAboveAir', 'temperatureDifference', 'How much warmer than the air the surroundings the body radiates to are.'),
  q('heatCapacity', 'heatCapacity', 'Heat capacity Σ m·c of the damper (body, oil and parts).'),
  q('conductance', 'thermalConductance', 'Heat-loss conductance UA = (h_conv + h_r)·A of the body at its steady operating temperature.'),
  q('steadyTemperature', 'temperature', 'Body temperature at which the mean power leaves the body (steady state).'),
  // limits
  q('allowedTemperature', 'temperature', 'Highest body (oil, seal) temperature the maker allows.', 'limit'),
  q('dutyLength', 'time', 'Length of the duty the damper must carry without passing the allowed temperature.', 'limit'),
  q('allowedFade', 'dimensionless', 'Largest share of the damping coefficient that may be lost to fade (1 − c/c_ref).', 'limit'),
  q('allowedTyreLoadRatio', 'dimensionless', 'Largest RMS dynamic tyre load as a share of the static load (road holding; at 1/3 a Gaussian load lifts the tyre about 0.13 % of the time).', 'limit'),
  q('availableTravel', 'length', 'Suspension travel available from the static position to the bump stop (at the wheel).', 'limit'),
  q('ratedStrokeEnergy', 'energy', 'Energy per stroke the end-stop damper is rated for (its maker\'s data).', 'limit'),
  q('ratedHourlyEnergy', 'energy', 'Energy per hour the end-stop damper is rated for (its maker\'s data; the heat it can shed).', 'limit'),
];

const byName = new Map(STUDY_QUANTITIES.map((x) => [x.name, x]));
if (byName.size !== STUDY_QUANTITIES.length) throw new Error('study quantities: duplicate name');

export function studyQuantity(name: string): StudyQuantity | undefined {
  return byName.get(name);
}
