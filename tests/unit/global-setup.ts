// Placeholder replaced by the database setup in the foundation work.
export default async function setup() {}
