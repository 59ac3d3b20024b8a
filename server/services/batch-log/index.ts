/**
 * The batch log: signed, append-only entries chained by SHA-256 per batch, by what each part owns:
 * appending, the chain, the answer the API gives, and corrections.
 */
export { appendLogEntries, appendLogEntry, brewDaySigned, writeMetaFromHeaders, type LogActor } from './append';
export { canonicalJson, entryContent, entryHash, GENESIS_HASH, sha256, verifyChain } from './chain';
export { batchActualsOf, batchLogJson, logEntries, toLogEntry } from './presentation';
export { refuseEntryChange } from './corrections';
