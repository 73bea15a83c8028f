// Placeholder entry replaced by the CLI work; prints usage.
console.log('usage: heed <analyze|check-cases|demo> ...');
