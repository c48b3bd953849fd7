import { Column, DataType, Model, Table } from 'sequelize-typescript';
import { ApiKeyScope } from '../api-key-scopes';

@Table({ tableName: 'api_keys', underscored: true, timestamps: true })
export class ApiKey extends Model {
  @Column({ type: DataType.UUID, primaryKey: true, defaultValue: DataType.UUIDV4 })
  declare id: string;

  @Column({ type: DataType.CHAR(12), allowNull: false, field: 'public_id' })
  declare publicId: string;

  @Column({ type: DataType.UUID, allowNull: false, field: 'team_id' })
  declare teamId: string;

  @Column({ type: DataType.STRING(100), allowNull: false })
  declare name: string;

  @Column({ type: DataType.ARRAY(DataType.STRING(32)), allowNull: false })
  declare scopes: ApiKeyScope[];

  @Column({ type: DataType.CHAR(64), allowNull: false, field: 'secret_hash' })
  declare secretHash: string;

  @Column({ type: DataType.UUID, allowNull: true, field: 'created_by_user_id' })
  declare createdByUserId: string | null;

  @Column({ type: DataType.DATE, allowNull: true, field: 'expires_at' })
  declare expiresAt: Date | null;

  @Column({ type: DataType.DATE, allowNull: true, field: 'revoked_at' })
  declare revokedAt: Date | null;

  @Column({ type: DataType.DATE, allowNull: true, field: 'retires_at' })
  declare retiresAt: Date | null;

  @Column({ type: DataType.UUID, allowNull: true, field: 'replaced_by_key_id' })
  declare replacedByKeyId: string | null;

  @Column({ type: DataType.DATE, allowNull: true, field: 'last_used_at' })
  declare lastUsedAt: Date | null;

  @Column({ type: DataType.STRING(64), allowNull: true, field: 'last_used_ip' })
  declare lastUsedIp: string | null;

  declare createdAt: Date;
}
