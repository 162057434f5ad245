// Every table the app reads or writes. better-auth's tables keep its camelCase column names;
// Kitwright's own tables use snake_case.
import type { ColumnType, Generated, Selectable } from "kysely";

type Timestamp = ColumnType<Date, Date | string | undefined, Date | string>;

export interface UserTable {
  id: string;
  name: string;
  email: string;
  emailVerified: boolean;
  image: string | null;
  createdAt: Timestamp;
  updatedAt: Timestamp;
  role: string | null;
  banned: boolean | null;
  banReason: string | null;
  banExpires: Timestamp | null;
}

export interface SessionTable {
  id: string;
  expiresAt: Timestamp;
  token: string;
  createdAt: Timestamp;
  updatedAt: Timestamp;
  ipAddress: string | null;
  userAgent: string | null;
  userId: string;
  impersonatedBy: string | null;
  activeOrganizationId: string | null;
}

export interface OrganizationTable {
  id: string;
  name: string;
  slug: string;
  logo: string | null;
  createdAt: Timestamp;
  metadata: string | null;
}

export interface MemberTable {
  id: string;
  organizationId: string;
  userId: string;
  role: string;
  createdAt: Timestamp;
}

export interface InvitationTable {
  id: string;
  organizationId: string;
  email: string;
  role: string | null;
  status: string;
  expiresAt: Timestamp;
  createdAt: Timestamp;
  inviterId: string;
}

export interface TeamApiKeyTable {
  id: Generated<string>;
  team_id: string;
  name: string;
  prefix: string;
  key_hash: string;
  created_by: string | null;
  created_at: Generated<Timestamp>;
  last_used_at: Timestamp | null;
  revoked_at: Timestamp | null;
}

export interface Database {
  user: UserTable;
  session: SessionTable;
  organization: OrganizationTable;
  member: MemberTable;
  invitation: InvitationTable;
  team_api_key: TeamApiKeyTable;
  pv_module: PvModuleTable;
}

export type User = Selectable<UserTable>;
export type TeamApiKey = Selectable<TeamApiKeyTable>;

export interface PvModuleTable {
  id: Generated<string>;
  maker: string;
  model: string;
  cell_technology: string;
  cells_in_series: number;
  pmax_w: number;
  vmp_v: number;
  imp_a: number;
  voc_v: number;
  isc_a: number;
  gamma_pmax_pct_per_c: number;
  beta_voc_pct_per_c: number;
  alpha_isc_pct_per_c: number;
  noct_c: number;
  length_mm: number;
  width_mm: number;
  mass_kg: number;
  created_at: Generated<Timestamp>;
  updated_at: Generated<Timestamp>;
}

export type PvModule = Selectable<PvModuleTable>;
