/** Thermal ageing of seals and oil: life laws, temperature histories and the Miner sum over them. */
export { ageingLife, halvingInterval, lnAgeingRate, temperatureForLife, validateAgeingLaw, type AgeingLaw } from './ageingLaw.ts';
export { formatTemperatureHistory, HISTORY_T_RANGE, MAX_HISTORY_ROWS, readTemperatureHistory, type TemperatureHistory } from './temperatureHistory.ts';
export { historyAgeing, type HistoryAgeing } from './historyDamage.ts';
