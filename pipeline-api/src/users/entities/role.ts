/** What a user may do across the shows they belong to (product.md, Roles). */
export enum Role {
  Admin = 'admin',
  TechnicalArtist = 'technical_artist',
  Animator = 'animator',
  Supervisor = 'supervisor',
  Producer = 'producer',
}
