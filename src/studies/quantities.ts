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
  q('motionRatio', 'dimensionless', 'Damper travel per wheel travel at the corner (installation ratio; 1 = damper on the wheel axis).'),
  q('strokeAmplitude', 'length', 'Amplitude (half of peak-to-peak) of a harmonic damper stroke.'),
  q('strokeFrequency', 'frequency', 'Frequency of a harmonic damper stroke.'),
  q('cycleEnergy', 'energy', 'Energy one damper dissipates in one cycle at its design amplitude and frequency.'),
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
  q('fadeShare', 'fraction', 'Viscous (laminar, bleed) share of the damping coefficient at the reference temperature; fitted by fade-fit.'),
  // body and air
  q('bodyDiameter', 'length', 'Outside diameter of the damper body exposed to air.'),
  q('bodyLength', 'length', 'Length of the damper body wetted by oil and exposed to air.'),
  q('bodyOrientation', 'choice', 'Axis of the damper body: horizontal or vertical.'),
  q('bodyEmissivity', 'fraction', 'Emissivity of the body surface.'),
  q('localFlowFactor', 'fraction', 'Share of the air speed that actually crosses the body (wheel-arch shielding).'),
  q('airTemperature', 'temperature', 'Air temperature away from the body (also the start temperature).'),
  q('surroundingsAboveAir', 'temperatureDifference', 'How much warmer than the air the surroundings the body radiates to are.'),
  q('heatCapacity', 'heatCapacity', 'Heat capacity Σ m·c of the damper (body, oil and parts).'),
  q('conductance', 'thermalConductance', 'Heat-loss conductance UA = (h_conv + h_r)·A (+ the mount conductance, when given) of the body at its steady operating temperature.'),
  q('steadyTemperature', 'temperature', 'Body temperature at which the mean power leaves the body (steady state).'),
  // gas charge
  q('gasChargePressure', 'pressure', 'Absolute gas pressure of a gas-charged damper set at charging, rod fully out.'),
  q('gasChargeTemperature', 'temperature', 'Temperature of gas and oil when the gas charge was set.'),
  q('gasVolume', 'volume', 'Gas volume of a gas-charged damper at charging, rod fully out.'),
  q('oilVolume', 'volume', 'Volume of oil in the damper (what expands into the gas space when hot).'),
  q('rodDiameter', 'length', 'Diameter of the damper piston rod.'),
  q('pistonDiameter', 'length', 'Working bore (piston diameter) of the damper pressure tube.'),
  q('gasPressure', 'pressure', 'Absolute gas pressure of the damper at its working temperature and rod position.'),
  q('gasExtensionForce', 'force', 'Force with which the gas charge pushes the rod out, (p − p_atm)·A_rod.'),
  // seal and oil ageing
  q('sealReferenceLife', 'time', 'Life of the seal (or oil) in its ageing test at the reference ageing temperature.'),
  q('sealReferenceTemperature', 'temperature', 'Temperature of the ageing test that gave the reference seal life.'),
  q('sealActivationEnergy', 'molarEnergy', 'Activation energy of the Arrhenius ageing law of the seal (or oil).'),
  q('timeInService', 'time', 'Time the damper has already served under the duty of the study.'),
  q('sealLife', 'time', 'Life of the seal (or oil) under the temperature history of the duty, repeated.'),
  q('equivalentAgeingTemperature', 'temperature', 'Constant temperature that ages the seal as much as the duty\'s temperature history in the same time.'),
  q('solarAbsorptivity', 'fraction', 'Share of the sunlight falling on the body that it absorbs (α_s of its finish).'),
  q('solarIrradiance', 'heatFlux', 'Sunlight on a plane square to the beam at the damper (about 1000 W/m² at a clear noon).'),
  q('thermalModel', 'choice', 'One node (oil at the body temperature) or two nodes (oil and body joined by G_ob).'),
  q('oilBodyConductance', 'thermalConductance', 'Conductance G_ob from the oil to the body (inner film × wetted wall, + piston and rod).'),
  q('oilHeatCapacity', 'heatCapacity', 'Heat capacity m·c of the oil node (part of the damper heat capacity).'),
  q('oilTemperature', 'temperature', 'Steady oil temperature at the duty: what fades the damping, loads the gas charge and ages the seals and oil.'),
  // limits
  q('allowedTemperature', 'temperature', 'Highest body (oil, seal) temperature the maker allows.', 'limit'),
  q('dutyLength', 'time', 'Length of the duty the damper must carry without passing the allowed temperature.', 'limit'),
  q('allowedFade', 'fraction', 'Largest share of the damping coefficient that may be lost to fade (1 − c/c_ref).', 'limit'),
  q('allowedTyreLoadRatio', 'fraction', 'Largest RMS dynamic tyre load as a share of the static load (road holding; at 1/3 a Gaussian load lifts the tyre about 0.13 % of the time).', 'limit'),
  q('availableTravel', 'length', 'Suspension travel available from the static position to the bump stop (at the wheel).', 'limit'),
  q('ratedStrokeEnergy', 'energy', 'Energy per stroke the end-stop damper is rated for (its maker\'s data).', 'limit'),
  q('ratedHourlyEnergy', 'energy', 'Energy per hour the end-stop damper is rated for (its maker\'s data; the heat it can shed).', 'limit'),
];

const byName = new Map(STUDY_QUANTITIES.map((x) => [x.name, x]));
if (byName.size !== STUDY_QUANTITIES.length) throw new Error('study quantities: duplicate name');

export function studyQuantity(name: string): StudyQuantity | undefined {
  return byName.get(name);
}
