/** Deterministic maths: the same bits from every JavaScript engine (see exp-log.ts and trig.ts). */
export { exp, expm1, log, pow } from './exp-log';
export { atan, atan2, cos, hypot3, sin } from './trig';
