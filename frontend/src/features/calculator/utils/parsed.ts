/** What a parser makes of one field's text: nothing yet, a usable value, or a problem to show under the field. */
export type Parsed<V> = { kind: 'empty' } | { kind: 'ok'; value: V } | { kind: 'invalid'; message: string };
