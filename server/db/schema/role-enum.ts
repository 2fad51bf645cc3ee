import { pgEnum } from 'drizzle-orm/pg-core';
import { roles } from '@shared/auth/role';

export const roleEnum = pgEnum('role', roles);
