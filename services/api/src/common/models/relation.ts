/**
 * Wraps the type of an association property. Models that point at each other import each other;
 * a bare class type there makes the compiler's decorator metadata read the other class while it
 * is still being defined. Through this alias the metadata says `Object` and the cycle is harmless.
 */
export type Relation<T> = T;
