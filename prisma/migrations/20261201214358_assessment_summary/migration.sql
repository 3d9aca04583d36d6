-- AlterTable
ALTER TABLE "AssetAssessment" ADD COLUMN     "summary" JSONB;

