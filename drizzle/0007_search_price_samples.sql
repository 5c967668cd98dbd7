-- Price on the fixed samples (custom migration). A price range over a sample of search rows (the counting of
-- broad searches, server/services/search.ts) needs an index that holds only the sample's listings; the full
-- price index would hand over every listing in the range first.
CREATE INDEX search_docs_price_s16_idx ON search_docs (price, doc_id) WHERE is_listing AND doc_id % 16 = 0;--> statement-breakpoint
CREATE INDEX search_docs_price_s128_idx ON search_docs (price, doc_id) WHERE is_listing AND doc_id % 128 = 0;
