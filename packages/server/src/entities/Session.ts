import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * A browser session, written by connect-pg-simple (its own schema: sid, sess, expire).
 * The app reads it only to end a user's sessions, e.g. after a password reset.
 */
@Entity({ name: 'sessions' })
export class Session {
  @PrimaryColumn({ type: 'varchar', length: 255 })
  sid: string;

  @Column({ type: 'json' })
  sess: Record<string, unknown>;

  @Column({ type: 'timestamp', precision: 6 })
  expire: Date;
}
