import { Column, Entity, PrimaryColumn } from 'typeorm';

/** The device's copy of one library entry (current revision). `body` is the shared LibraryEntry JSON. */
@Entity('library_entry')
export class LocalLibraryEntry {
  @PrimaryColumn({ type: 'varchar', length: 80 })
  id: string;

  @Column({ type: 'varchar', length: 200 })
  name: string;

  @Column({ type: 'varchar', length: 20 })
  category: string;

  @Column({ type: 'varchar', length: 20 })
  solvent: string;

  @Column({ type: 'integer', default: 1 })
  revision: number;

  @Column({ type: 'text' })
  body: string;

  @Column({ type: 'varchar', length: 40 })
  updatedAt: string;
}
