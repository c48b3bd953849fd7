import { Column, DataType, Model, Table } from 'sequelize-typescript';

@Table({ tableName: 'users', underscored: true, timestamps: true })
export class User extends Model {
  @Column({ type: DataType.UUID, primaryKey: true, defaultValue: DataType.UUIDV4 })
  declare id: string;

  @Column({ type: DataType.STRING(320), allowNull: false })
  declare email: string;

  @Column({ type: DataType.STRING(120), allowNull: false, field: 'display_name' })
  declare displayName: string;

  @Column({ type: DataType.STRING(100), allowNull: false, field: 'password_hash' })
  declare passwordHash: string;

  @Column({ type: DataType.DATE, allowNull: false, field: 'password_changed_at', defaultValue: DataType.NOW })
  declare passwordChangedAt: Date;

  declare createdAt: Date;
}
