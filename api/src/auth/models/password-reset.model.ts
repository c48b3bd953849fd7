import { Column, DataType, Model, Table } from 'sequelize-typescript';

@Table({ tableName: 'password_resets', underscored: true, timestamps: true, updatedAt: false })
export class PasswordReset extends Model {
  @Column({ type: DataType.UUID, primaryKey: true, defaultValue: DataType.UUIDV4 })
  declare id: string;

  @Column({ type: DataType.UUID, allowNull: false, field: 'user_id' })
  declare userId: string;

  @Column({ type: DataType.CHAR(64), allowNull: false, field: 'token_hash' })
  declare tokenHash: string;

  @Column({ type: DataType.STRING(64), allowNull: true, field: 'requested_from_ip' })
  declare requestedFromIp: string | null;

  @Column({ type: DataType.DATE, allowNull: false, field: 'expires_at' })
  declare expiresAt: Date;

  @Column({ type: DataType.DATE, allowNull: true, field: 'used_at' })
  declare usedAt: Date | null;
}
