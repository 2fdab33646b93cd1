/**
 * Where each hood setting sits in packHoods' Float64Array (one HOOD_STRIDE per hood). A module
 * that indexes with them in a hot loop copies them into its own module-level consts first (see
 * hood-field.ts), so V8 compiles them as literal offsets.
 */
export const HOOD_KIND = 0;
/** Face centre, m. */
export const HOOD_X = 1;
export const HOOD_Y = 2;
export const HOOD_Z = 3;
/** Unit face normal, out of the face into the room. */
export const HOOD_NX = 4;
export const HOOD_NY = 5;
export const HOOD_NZ = 6;
/** Unit vector across the face's width (along a slot). */
export const HOOD_E1X = 7;
export const HOOD_E1Y = 8;
export const HOOD_E1Z = 9;
/** Unit vector across the face's height. */
export const HOOD_E2X = 10;
export const HOOD_E2Y = 11;
export const HOOD_E2Z = 12;
export const HOOD_HALF_WIDTH = 13;
export const HOOD_HALF_HEIGHT = 14;
export const HOOD_AIRFLOW = 15;
export const HOOD_AREA = 16;
/** Share of the airflow drawn from in front of the face (1 flanged or a downdraft bench, 0.75 plain: shared/physics/hood-face.ts). */
export const HOOD_FRONT_SHARE = 17;
export const HOOD_FACE_VELOCITY = 18;
/** The face outline's farthest point from the centre. */
export const HOOD_REACH = 19;
/** Beyond this squared distance from the centre the face draws as a point sink. */
export const HOOD_FAR2 = 20;
export const HOOD_STRIDE = 21;

/** Codes for HOOD_KIND, in HOOD_KINDS order. */
export const KIND_PLAIN = 0;
export const KIND_FLANGED = 1;
export const KIND_SLOT = 2;
export const KIND_FLANGED_SLOT = 3;
export const KIND_BOOTH = 4;
/** Draws as a flanged opening facing up: the work surface is its flange. */
export const KIND_DOWNDRAFT_BENCH = 5;
