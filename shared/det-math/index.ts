/** Deterministic maths: the same bits from every JavaScript engine (see exp-log.ts and trig.ts). */
export { exp, expIO, expm1, expm1IO, log, logIO, pow } from './exp-log';
export { atan, atan2, atan2IO, atanIO, cos, hypot3, sin } from './trig';
export { IO } from './words';
