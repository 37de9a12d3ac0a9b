const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Whether a path segment can be a row id; anything else is simply not found. */
export const isUuid = (value: string | undefined): value is string => !!value && UUID.test(value);
