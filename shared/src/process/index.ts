// Public surface of the process-science library (pure functions, no I/O).
export * from './capability';
export * from './constants';
export * from './control-chart';
export * from './cure-dose';
export * from './electrical';
export * from './film-thickness';
export * from './jettability';
export * from './jetting-windows';
export * from './line-geometry';
export * from './probe-liquids';
export * from './process-input-error';
export * from './run-rules';
export * from './strain-gauge';
export * from './thermal';
export * from './units';
export * from './wetting';
export * from './wetting-margin';
export { fieldLabel } from './field-labels';
