import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { TeamRole } from '../access/team-permissions';
import { Team } from './team.model';

@Table({ tableName: 'team_memberships', underscored: true, timestamps: true })
export class Membership extends Model {
  @Column({ type: DataType.UUID, primaryKey: true, defaultValue: DataType.UUIDV4 })
  declare id: string;

  @ForeignKey(() => Team)
  @Column({ type: DataType.UUID, allowNull: false, field: 'team_id' })
  declare teamId: string;

  @Column({ type: DataType.UUID, allowNull: false, field: 'user_id' })
  declare userId: string;

  @Column({ type: DataType.STRING(16), allowNull: false })
  declare role: TeamRole;

  @BelongsTo(() => Team)
  declare team?: Team;

  declare createdAt: Date;
}
