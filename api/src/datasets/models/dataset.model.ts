import { Column, DataType, Model, Table } from 'sequelize-typescript';
import { ColumnSummary } from '../ingest/column-summary';

export interface StoredColumn {
  name: string;
  kind: 'numeric' | 'text';
  summary: ColumnSummary;
  /** For a text column that holds some numbers: where the first non-number is (1-based data row). */
  firstTextRow?: number;
  firstTextValue?: string;
}

@Table({ tableName: 'datasets', underscored: true, timestamps: false })
export class Dataset extends Model {
  @Column({ type: DataType.UUID, primaryKey: true })
  declare id: string;

  @Column({ type: DataType.UUID, allowNull: false, field: 'team_id' })
  declare teamId: string;

  @Column({ type: DataType.STRING(200), allowNull: false })
  declare name: string;

  @Column({ type: DataType.INTEGER, allowNull: false })
  declare version: number;

  @Column({ type: DataType.STRING(64), allowNull: false, field: 'content_hash' })
  declare contentHash: string;

  /** BIGINT arrives as a string from pg; converted where read. */
  @Column({ type: DataType.BIGINT, allowNull: false, field: 'row_count' })
  declare rowCount: string;

  @Column({ type: DataType.BIGINT, allowNull: false, field: 'byte_size' })
  declare byteSize: string;

  @Column({ type: DataType.JSONB, allowNull: false })
  declare columns: StoredColumn[];

  @Column({ type: DataType.STRING(16), allowNull: false })
  declare source: 'csv' | 'json';

  @Column({ type: DataType.STRING(200), allowNull: true, field: 'created_by' })
  declare createdBy: string | null;

  @Column({ type: DataType.DATE, allowNull: false, field: 'created_at' })
  declare createdAt: Date;

  @Column({ type: DataType.DATE, allowNull: true, field: 'deleted_at' })
  declare deletedAt: Date | null;

  @Column({ type: DataType.STRING(200), allowNull: true, field: 'deleted_by' })
  declare deletedBy: string | null;
}
