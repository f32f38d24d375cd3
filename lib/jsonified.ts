/** What a value becomes after JSON.stringify and JSON.parse: dates turn into ISO strings. */
export type Jsonified<T> = T extends Date ? string : T extends (infer U)[] ? Jsonified<U>[] : T extends object ? { [K in keyof T]: Jsonified<T[K]> } : T;
