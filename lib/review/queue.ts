/** The office's review queue size (its `total`), shown beside "Review" in the desk navigation. */
export const REVIEW_COUNT_URL = '/api/installs?status=awaiting_review&pageSize=1';
