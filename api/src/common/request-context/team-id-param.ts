import { ApiParam } from '@nestjs/swagger';

/** OpenAPI description of the {teamId} path parameter (TeamPermissionGuard validates it). */
export const ApiTeamIdParam = () => ApiParam({ name: 'teamId', format: 'uuid', description: 'The team.' });
