import { DataTypes, type QueryInterface } from 'sequelize';

// Images uploaded for posts are recorded per member, so a member's storage can be capped and images that never
// made it into a saved post (or were taken out of one) can be removed after a grace period. Listing photos
// record their size too: they count against the same per-member quota.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('uploaded_images', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    user_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    storage_key: { type: DataTypes.STRING(200), allowNull: false, unique: true },
    thumb_key: { type: DataTypes.STRING(200), allowNull: false },
    bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    // Set while a saved post (or its pending revision) shows the image; null means unused since released_at.
    claimed_at: { type: DataTypes.DATE, allowNull: true },
    released_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('uploaded_images', ['user_id', 'claimed_at'], {
    name: 'uploaded_images_user_claimed',
  });
  await qi.addIndex('uploaded_images', ['claimed_at', 'released_at'], {
    name: 'uploaded_images_unused',
  });
  await qi.addColumn('listing_photos', 'bytes', {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: false,
    defaultValue: 0,
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('listing_photos', 'bytes');
  await qi.dropTable('uploaded_images');
}
