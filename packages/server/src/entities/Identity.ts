import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A sign-in identity at an outside provider (GitHub), linked to one user. */
@Entity({ name: 'identities' })
export class Identity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @Column({ type: 'varchar', length: 32 })
  provider: string;

  @Column({ name: 'provider_user_id', type: 'varchar', length: 128 })
  providerUserId: string;

  @Column({ type: 'varchar', length: 128, nullable: true })
  login: string | null;

  @Column({ type: 'varchar', length: 254, nullable: true })
  email: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
