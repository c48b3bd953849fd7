import { Column, DataType, Model, Table } from 'sequelize-typescript';

@Table({ tableName: 'teams', underscored: true, timestamps: true })
export class Team extends Model {
  @Column({ type: DataType.UUID, primaryKey: true, defaultValue: DataType.UUIDV4 })
  declare id: string;

  @Column({ type: DataType.STRING(64), allowNull: false })
  declare slug: string;

  @Column({ type: DataType.STRING(200), allowNull: false })
  declare name: string;

  @Column({ type: DataType.STRING(32), allowNull: false })
  declare plan: string;

  @Column({ type: DataType.BOOLEAN, allowNull: false, field: 'is_demo' })
  declare isDemo: boolean;

  @Column({ type: DataType.BOOLEAN, allowNull: false, field: 'developer_keys_allowed', defaultValue: false })
  declare developerKeysAllowed: boolean;

  declare createdAt: Date;
}
