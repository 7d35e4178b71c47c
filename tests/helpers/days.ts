// A UTC day as YYYY-MM-DD, `offset` days from now. Populations that filter by part start a day early,
// so captures made just before midnight UTC stay inside them.
export const utcDay = (offset = 0): string => new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);
