import { Column, DataType, Model, Table } from 'sequelize-typescript';

@Table({ tableName: 'sessions', underscored: true, timestamps: true, updatedAt: false })
export class Session extends Model {
  @Column({ type: DataType.UUID, primaryKey: true, defaultValue: DataType.UUIDV4 })
  declare id: string;

  @Column({ type: DataType.CHAR(64), allowNull: false, field: 'token_hash' })
  declare tokenHash: string;

  @Column({ type: DataType.UUID, allowNull: false, field: 'user_id' })
  declare userId: string;

  @Column({ type: DataType.STRING(64), allowNull: true, field: 'ip_address' })
  declare ipAddress: string | null;

  @Column({ type: DataType.STRING(300), allowNull: true, field: 'user_agent' })
  declare userAgent: string | null;

  @Column({ type: DataType.DATE, allowNull: false, field: 'expires_at' })
  declare expiresAt: Date;

  declare createdAt: Date;
}
