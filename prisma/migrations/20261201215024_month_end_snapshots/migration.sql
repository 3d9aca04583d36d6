-- CreateTable
CREATE TABLE "MonthEndSnapshot" (
    "id" SERIAL NOT NULL,
    "assetId" INTEGER NOT NULL,
    "monthEnd" TIMESTAMPTZ(3) NOT NULL,
    "status" TEXT NOT NULL,
    "summary" JSONB,
    "computedAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "MonthEndSnapshot_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE UNIQUE INDEX "MonthEndSnapshot_assetId_monthEnd_key" ON "MonthEndSnapshot"("assetId", "monthEnd");

-- AddForeignKey
ALTER TABLE "MonthEndSnapshot" ADD CONSTRAINT "MonthEndSnapshot_assetId_fkey" FOREIGN KEY ("assetId") REFERENCES "Asset"("id") ON DELETE CASCADE ON UPDATE CASCADE;

