CREATE TABLE "invitations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"email" text NOT NULL,
	"role" text NOT NULL,
	"token_hash" text NOT NULL,
	"invited_by" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"accepted_at" timestamp with time zone,
	"revoked_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "memberships" (
	"studio_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"role" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "memberships_studio_id_user_id_pk" PRIMARY KEY("studio_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "password_resets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "session" (
	"sid" varchar PRIMARY KEY NOT NULL,
	"sess" json NOT NULL,
	"expire" timestamp (6) NOT NULL
);
--> statement-breakpoint
CREATE TABLE "studios" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"palette_limit" integer DEFAULT 6 NOT NULL,
	"ready_weeks_before_launch" integer DEFAULT 8 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"password_hash" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "motif_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"motif_id" uuid NOT NULL,
	"studio_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"original_id" uuid NOT NULL,
	"content_hash" text NOT NULL,
	"dhash" text NOT NULL,
	"png_key" text NOT NULL,
	"thumb_key" text NOT NULL,
	"png_bytes" integer NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"offset_x" integer NOT NULL,
	"offset_y" integer NOT NULL,
	"opacity" real NOT NULL,
	"blend_mode" text NOT NULL,
	"text" jsonb,
	"colours" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "motifs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"original_id" uuid NOT NULL,
	"name" text NOT NULL,
	"source_path" text NOT NULL,
	"kind" text NOT NULL,
	"hidden_in_original" boolean DEFAULT false NOT NULL,
	"archived" boolean DEFAULT false NOT NULL,
	"current_version" integer DEFAULT 1 NOT NULL,
	"tags" text[] DEFAULT '{}' NOT NULL,
	"suggested_tags" text[] DEFAULT '{}' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"rights_status" text DEFAULT 'own_work' NOT NULL,
	"rights_source" text DEFAULT '' NOT NULL,
	"rights_licence" text DEFAULT '' NOT NULL,
	"attribution_required" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "original_motifs" (
	"original_id" uuid NOT NULL,
	"motif_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"source_path" text NOT NULL,
	"position" integer NOT NULL,
	"linked_existing" boolean DEFAULT false NOT NULL
);
--> statement-breakpoint
CREATE TABLE "originals" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"name" text NOT NULL,
	"file_kind" text NOT NULL,
	"byte_size" bigint NOT NULL,
	"file_sha256" text NOT NULL,
	"storage_key" text NOT NULL,
	"status" text DEFAULT 'queued' NOT NULL,
	"phase" text DEFAULT 'queued' NOT NULL,
	"percent" integer DEFAULT 0 NOT NULL,
	"cut" text DEFAULT 'groups' NOT NULL,
	"width" integer,
	"height" integer,
	"layer_count" integer,
	"report" jsonb,
	"error" jsonb,
	"attempts" integer DEFAULT 0 NOT NULL,
	"previous_original_id" uuid,
	"lineage_id" uuid NOT NULL,
	"uploaded_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"imported_at" timestamp with time zone
);
--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_invited_by_users_id_fk" FOREIGN KEY ("invited_by") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "password_resets" ADD CONSTRAINT "password_resets_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "motif_versions" ADD CONSTRAINT "motif_versions_motif_id_motifs_id_fk" FOREIGN KEY ("motif_id") REFERENCES "public"."motifs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "motif_versions" ADD CONSTRAINT "motif_versions_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "motif_versions" ADD CONSTRAINT "motif_versions_original_id_originals_id_fk" FOREIGN KEY ("original_id") REFERENCES "public"."originals"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "motifs" ADD CONSTRAINT "motifs_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "motifs" ADD CONSTRAINT "motifs_original_id_originals_id_fk" FOREIGN KEY ("original_id") REFERENCES "public"."originals"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "original_motifs" ADD CONSTRAINT "original_motifs_original_id_originals_id_fk" FOREIGN KEY ("original_id") REFERENCES "public"."originals"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "original_motifs" ADD CONSTRAINT "original_motifs_motif_id_motifs_id_fk" FOREIGN KEY ("motif_id") REFERENCES "public"."motifs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "originals" ADD CONSTRAINT "originals_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "originals" ADD CONSTRAINT "originals_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "invitations_token_key" ON "invitations" USING btree ("token_hash");--> statement-breakpoint
CREATE INDEX "invitations_studio_idx" ON "invitations" USING btree ("studio_id");--> statement-breakpoint
CREATE INDEX "memberships_user_idx" ON "memberships" USING btree ("user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "password_resets_token_key" ON "password_resets" USING btree ("token_hash");--> statement-breakpoint
CREATE INDEX "IDX_session_expire" ON "session" USING btree ("expire");--> statement-breakpoint
CREATE UNIQUE INDEX "users_email_key" ON "users" USING btree ("email");--> statement-breakpoint
CREATE UNIQUE INDEX "motif_versions_motif_version_key" ON "motif_versions" USING btree ("motif_id","version");--> statement-breakpoint
CREATE INDEX "motif_versions_studio_hash_idx" ON "motif_versions" USING btree ("studio_id","content_hash");--> statement-breakpoint
CREATE INDEX "motifs_studio_idx" ON "motifs" USING btree ("studio_id","created_at");--> statement-breakpoint
CREATE INDEX "motifs_original_idx" ON "motifs" USING btree ("original_id");--> statement-breakpoint
CREATE UNIQUE INDEX "original_motifs_key" ON "original_motifs" USING btree ("original_id","motif_id","source_path");--> statement-breakpoint
CREATE INDEX "originals_studio_idx" ON "originals" USING btree ("studio_id","created_at");