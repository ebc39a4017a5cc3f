CREATE TABLE "product_motifs" (
	"product_id" uuid NOT NULL,
	"motif_id" uuid NOT NULL,
	"placement_id" text NOT NULL,
	"version" integer NOT NULL,
	CONSTRAINT "product_motifs_product_id_placement_id_pk" PRIMARY KEY("product_id","placement_id")
);
--> statement-breakpoint
CREATE TABLE "products" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"name" text NOT NULL,
	"template_id" text NOT NULL,
	"layout" jsonb NOT NULL,
	"revision" integer DEFAULT 1 NOT NULL,
	"stage" text DEFAULT 'drafting' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "studio_templates" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"spec" jsonb NOT NULL,
	"guide_image_key" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "product_motifs" ADD CONSTRAINT "product_motifs_product_id_products_id_fk" FOREIGN KEY ("product_id") REFERENCES "public"."products"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "product_motifs" ADD CONSTRAINT "product_motifs_motif_id_motifs_id_fk" FOREIGN KEY ("motif_id") REFERENCES "public"."motifs"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "products" ADD CONSTRAINT "products_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "products" ADD CONSTRAINT "products_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "studio_templates" ADD CONSTRAINT "studio_templates_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "product_motifs_motif_idx" ON "product_motifs" USING btree ("motif_id");--> statement-breakpoint
CREATE INDEX "products_studio_idx" ON "products" USING btree ("studio_id","updated_at");--> statement-breakpoint
CREATE INDEX "studio_templates_studio_idx" ON "studio_templates" USING btree ("studio_id");