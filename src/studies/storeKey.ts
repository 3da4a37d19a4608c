/** The browser's localStorage key of the open study (pages, /studies/open/, `dampbook study sheet`). Its own module so small page scripts can use it without the study schema. */
export const STUDY_STORE = 'dampbook:study';
/** Dispatched on `document` when this page stores or closes the open study (the sheet header follows it). */
export const STUDY_STORED_EVENT = 'db-study-stored';
