import type { AllowableBasis, Barometer } from '@hoopline/calc';
import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { JsonObject } from './json';
import type { UnitSystem } from './user.entity';

/** A site field as typed: text with its unit, or an SI number. */
export type SiteAsTyped = { altitude?: string | number; ambientPressure?: string | number };

import type { Role as ProjectRole } from '@hoopline/contract';

export type { ProjectRole };

@Entity('projects')
export class ProjectEntity {
  @PrimaryColumn('uuid') id: string;
  @Column('text') number: string;
  @Column('text') name: string;
  @Column('text') client: string;
  /** Site altitude, m (SI); or the ambient pressure below, never both. */
  @Column('double precision', { name: 'site_altitude', nullable: true })
  siteAltitude: number | null;
  /** Site ambient pressure, Pa (absolute). */
  @Column('double precision', { name: 'site_ambient_pressure', nullable: true })
  siteAmbientPressure: number | null;
  /** The site as typed ({ altitude: "5280 ft" }); null for projects from before it was kept. */
  @Column('jsonb', { name: 'site_as_typed', nullable: true })
  siteAsTyped: SiteAsTyped | null;
  /** Basis of the allowable stress of every component (the calc's designBasis.allowableStress). */
  @Column('text', { name: 'allowable_basis', default: 'asme-viii-1' })
  allowableBasis: AllowableBasis;
  /** Barometer every component is designed for (the calc's designBasis.barometer). */
  @Column('text', { name: 'design_barometer', default: 'standard' })
  designBarometer: Barometer;
  /**
   * The default design temperature of its components, as typed ("150 degC"),
   * written into inputs that give none (the calc's designTemperature); null: none.
   */
  @Column('jsonb', { name: 'design_temperature', nullable: true })
  designTemperature: string | number | null;
  @Column('text', { name: 'unit_system' }) unitSystem: UnitSystem;
  /** The checker types their password again to sign off (migration 1765500005000). */
  @Column('boolean', { name: 'sign_off_password', default: false }) signOffPassword: boolean;
  @Column('text') notes: string;
  @Column('integer') version: number;
  @Column('uuid', { name: 'created_by', nullable: true }) createdBy: string | null;
  @Column('timestamptz', { name: 'created_at' }) createdAt: Date;
  @Column('timestamptz', { name: 'updated_at' }) updatedAt: Date;
}

@Entity('project_members')
export class ProjectMemberEntity {
  @PrimaryColumn('uuid', { name: 'project_id' }) projectId: string;
  @PrimaryColumn('uuid', { name: 'user_id' }) userId: string;
  @Column('text') role: ProjectRole;
  @Column('uuid', { name: 'added_by', nullable: true }) addedBy: string | null;
  @Column('timestamptz', { name: 'added_at' }) addedAt: Date;
}

@Entity('custom_materials')
export class CustomMaterialEntity {
  @PrimaryColumn('uuid') id: string;
  @Column('uuid', { name: 'project_id' }) projectId: string;
  @Column('text') name: string;
  /** The material as the calc's customMaterialSchema parsed it (SI numbers). */
  @Column('jsonb') material: JsonObject;
  @Column('uuid', { name: 'created_by', nullable: true }) createdBy: string | null;
  @Column('timestamptz', { name: 'created_at' }) createdAt: Date;
}
