import { Dataset } from './models/dataset.model';
import { DatasetDto } from './dto/dataset.dto';

export function toDatasetDto(dataset: Dataset): DatasetDto {
  return {
    id: dataset.id,
    name: dataset.name,
    version: dataset.version,
    contentHash: dataset.contentHash,
    rowCount: Number(dataset.rowCount),
    byteSize: Number(dataset.byteSize),
    source: dataset.source,
    createdBy: dataset.createdBy,
    createdAt: dataset.createdAt.toISOString(),
    columns: dataset.columns.map((column) => ({
      name: column.name,
      kind: column.kind,
      ...column.summary,
      ...(column.firstTextRow !== undefined ? { firstTextRow: column.firstTextRow, firstTextValue: column.firstTextValue } : {}),
    })),
  };
}
