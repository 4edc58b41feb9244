-- Full-text search over entry revisions (drizzle's schema DSL has no FULLTEXT index).
ALTER TABLE `entry_revisions` ADD FULLTEXT INDEX `entry_revisions_fulltext` (`title`, `body`);
