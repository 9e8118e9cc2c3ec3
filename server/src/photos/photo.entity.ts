import { Entity, Index, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';

/**
 * One uploaded image, re-encoded, with a thumbnail. `subjectType` + `subjectId` say what it
 * belongs to (an animal, a molt, later a sac opening); the subject's module decides who may see it.
 */
@Entity({ tableName: 'photos' })
@Index({ properties: ['subjectType', 'subjectId'] })
export class Photo extends BaseEntity {
  @ManyToOne(() => User, { deleteRule: 'cascade' })
  uploadedBy!: User;

  @Property({ type: 'text' })
  subjectType!: string;

  @Property({ type: 'uuid' })
  subjectId!: string;

  @Property({ type: 'text' })
  storageKey!: string;

  @Property({ type: 'text' })
  thumbKey!: string;

  @Property({ type: 'text' })
  contentType!: string;

  @Property({ type: 'integer' })
  width!: number;

  @Property({ type: 'integer' })
  height!: number;

  @Property({ type: 'integer' })
  bytes!: number;
}
