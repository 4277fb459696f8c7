/** class-validator's IsNumber options for every numeric field: NaN and ±Infinity are not numbers a user meant. */
export const FINITE = { allowNaN: false, allowInfinity: false };
