CREATE TABLE "collection_motifs" (
	"collection_id" uuid NOT NULL,
	"motif_id" uuid NOT NULL,
	"added_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "collection_motifs_collection_id_motif_id_pk" PRIMARY KEY("collection_id","motif_id")
);
--> statement-breakpoint
CREATE TABLE "collections" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"name" text NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"season_start" date,
	"season_end" date,
	"launch_date" date,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "library_changes" (
	"studio_id" uuid NOT NULL,
	"version" bigint NOT NULL,
	"motif_ids" uuid[],
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "library_changes_studio_id_version_pk" PRIMARY KEY("studio_id","version")
);
--> statement-breakpoint
CREATE TABLE "library_state" (
	"studio_id" uuid PRIMARY KEY NOT NULL,
	"version" bigint NOT NULL
);
--> statement-breakpoint
ALTER TABLE "collection_motifs" ADD CONSTRAINT "collection_motifs_collection_id_collections_id_fk" FOREIGN KEY ("collection_id") REFERENCES "public"."collections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "collection_motifs" ADD CONSTRAINT "collection_motifs_motif_id_motifs_id_fk" FOREIGN KEY ("motif_id") REFERENCES "public"."motifs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "collections" ADD CONSTRAINT "collections_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "library_changes" ADD CONSTRAINT "library_changes_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "library_state" ADD CONSTRAINT "library_state_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "collection_motifs_motif_idx" ON "collection_motifs" USING btree ("motif_id");--> statement-breakpoint
CREATE UNIQUE INDEX "collections_studio_name_key" ON "collections" USING btree ("studio_id",lower("name"));