export type { LogError, LogFormat, LogTable, LogWarning, ParseLogResult, TimeFormat } from './types';
export { parseLog } from './parse-log';
export { applyMapping, type ApplyMappingResult } from './apply-mapping';
export { columnMappingSchema, mappingSchemaFor, suggestMapping, LOG_UNITS, type ColumnMapping, type LogUnit, type MappedColumn } from './mapping';
export { LOG_EXTENSIONS, MAX_LOG_BYTES, logFormatFromName, sniffLogType } from './limits';
export { MAX_REPORTED_ERRORS } from './errors';
