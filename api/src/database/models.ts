import { ModelCtor } from 'sequelize-typescript';
import { Team } from '../teams/models/team.model';

/**
 * Every Sequelize model, registered on the one connection. Features still reach other features' data only
 * through the exported services; this list exists because models are registered explicitly (see
 * DatabaseModule for why automatic loading stays off).
 */
export const ALL_MODELS: ModelCtor[] = [Team];
