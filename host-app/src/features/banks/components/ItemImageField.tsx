import { Button, Flex, Text } from '@radix-ui/themes';
import { FileInput } from '@/features/forms/components/FileInput';
import { useUploadImage } from '../hooks/useUploadImage';

export interface ItemImageFieldProps {
  imageUrl: string | null;
  errors: string[];
  disabled?: boolean;
  onChange: (image: { id: string; url: string } | null) => void;
}

/** An optional picture for the item: uploaded as soon as it is chosen, shown as a thumbnail. */
export function ItemImageField({ imageUrl, errors, disabled, onChange }: ItemImageFieldProps) {
  const upload = useUploadImage();
  const onFile = (file: File | null) => {
    if (!file) return;
    upload.mutate(file, { onSuccess: (media) => onChange({ id: media.id, url: media.url }) });
  };
  const problems = [...errors, ...(upload.error ? [upload.error.message] : [])];

  return (
    <Flex direction="column" gap="2">
      <FileInput
        label="Image (optional)"
        hint="PNG, JPEG or WebP. Describe anything important in the prompt too, for students who cannot see it."
        accept="image/png,image/jpeg,image/webp"
        disabled={disabled || upload.isPending}
        errors={problems}
        onFile={onFile}
      />
      {upload.isPending && (
        <Text size="2" color="gray" role="status">
          Uploading…
        </Text>
      )}
      {imageUrl && (
        <Flex gap="3" align="end">
          <img src={imageUrl} alt="Thumbnail of the item's image" className="item-thumbnail" />
          {!disabled && (
            <Button type="button" size="1" variant="soft" color="gray" onClick={() => onChange(null)}>
              Remove image
            </Button>
          )}
        </Flex>
      )}
    </Flex>
  );
}
