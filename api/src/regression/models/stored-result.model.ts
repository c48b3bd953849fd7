import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** A billable answer kept for retrieval and audit: the specification, the input hash and the result. */
@Table({ tableName: 'fit_results', underscored: true, timestamps: false })
export class StoredResult extends Model {
  @Column({ type: DataType.UUID, primaryKey: true })
  declare id: string;

  @Column({ type: DataType.UUID, allowNull: false, field: 'team_id' })
  declare teamId: string;

  @Column({ type: DataType.STRING(32), allowNull: false })
  declare kind: string;

  @Column({ type: DataType.STRING(32), allowNull: false, field: 'engine_version' })
  declare engineVersion: string;

  @Column({ type: DataType.STRING(64), allowNull: false, field: 'input_hash' })
  declare inputHash: string;

  @Column({ type: DataType.JSONB, allowNull: false })
  declare specification: Record<string, unknown>;

  @Column({ type: DataType.JSONB, allowNull: false })
  declare result: Record<string, unknown>;

  /** What a later prediction needs (coefficients, covariance, sigma², df, smearing); fits only. */
  @Column({ type: DataType.JSONB, allowNull: true, field: 'model_snapshot' })
  declare modelSnapshot: Record<string, unknown> | null;

  @Column({ type: DataType.STRING(128), allowNull: false, field: 'request_id' })
  declare requestId: string;

  @Column({ type: DataType.STRING(64), allowNull: true, field: 'api_key_id' })
  declare apiKeyId: string | null;

  @Column({ type: DataType.DATE, allowNull: false, field: 'created_at' })
  declare createdAt: Date;
}
