-- A sign-off is frozen to what was checked: the database itself refuses to change or remove one.
-- (Deleting the sign still removes its sign-offs: InnoDB does not fire triggers for cascades.)
CREATE TRIGGER `sign_signoffs_no_update` BEFORE UPDATE ON `sign_signoffs` FOR EACH ROW SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'sign-offs are immutable';--> statement-breakpoint
CREATE TRIGGER `sign_signoffs_no_delete` BEFORE DELETE ON `sign_signoffs` FOR EACH ROW SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'sign-offs are immutable';
