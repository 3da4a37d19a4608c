/**
 * Quantity kinds. Absolute temperature and temperature difference are different kinds on
 * purpose: 20 °C is 293.15 K but a 20 °C rise is 20 K.
 */
export const QUANTITY_KINDS = [
  'dimensionless',
  'fraction',
  'length',
  'mass',
  'time',
  'force',
  'velocity',
  'acceleration',
  'stiffness',
  'damping',
  'energy',
  'power',
  'temperature',
  'temperatureDifference',
  'frequency',
  'angularFrequency',
  'angle',
  'area',
  'heatTransferCoefficient',
  'heatFlux',
  'kinematicViscosity',
  'dynamicViscosity',
  'heatCapacity',
  'specificHeat',
  'thermalConductance',
  'thermalConductivity',
  'density',
  'pressure',
  'roadRoughness',
  'velocityPsd',
  'accelerationPsd',
  'displacementPsd',
  'eventRate',
  'perTemperature',
  'momentOfInertia',
  'torque',
  'volume',
  'molarEnergy',
] as const;

export type QuantityKind = (typeof QUANTITY_KINDS)[number];

/** The SI unit symbol each kind is stored in inside the core. */
export const SI_SYMBOL: Record<QuantityKind, string> = {
  dimensionless: '',
  /** A share of a whole (damping ratio, efficiency, emissivity): the only kind offered in %. */
  fraction: '',
  length: 'm',
  mass: 'kg',
  time: 's',
  force: 'N',
  velocity: 'm/s',
  acceleration: 'm/s²',
  stiffness: 'N/m',
  damping: 'N·s/m',
  energy: 'J',
  power: 'W',
  temperature: 'K',
  temperatureDifference: 'K',
  frequency: 'Hz',
  angularFrequency: 'rad/s',
  angle: 'rad',
  area: 'm²',
  heatTransferCoefficient: 'W/(m²·K)',
  /** Heat flux or irradiance (sunlight on a surface). */
  heatFlux: 'W/m²',
  kinematicViscosity: 'm²/s',
  dynamicViscosity: 'Pa·s',
  heatCapacity: 'J/K',
  specificHeat: 'J/(kg·K)',
  thermalConductance: 'W/K',
  thermalConductivity: 'W/(m·K)',
  density: 'kg/m³',
  pressure: 'Pa',
  roadRoughness: 'm³',
  velocityPsd: '(m/s)²/Hz',
  accelerationPsd: '(m/s²)²/Hz',
  displacementPsd: 'm²/Hz',
  /** Events (impacts, strokes) per hour: the unit the calculators' keys (`cph`) are named in. */
  eventRate: '1/h',
  /** A fractional change per kelvin (thermal expansion coefficient, fade rate): 1/°F is 1.8 per K. */
  perTemperature: '1/K',
  /** Mass moment of inertia about an axis (rotary end-stop loads). */
  momentOfInertia: 'kg·m²',
  torque: 'N·m',
  /** A volume of oil or gas (not road roughness, whose unit is also m³). */
  volume: 'm³',
  /** Energy per amount of substance: the activation energy of an ageing reaction. */
  molarEnergy: 'J/mol',
};
